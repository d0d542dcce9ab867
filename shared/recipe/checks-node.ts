import type { CheckOptions, RecipeFinding } from '@/shared/recipe/checks-types';
import { CHECK_DEFAULTS } from '@/shared/recipe/defaults';
import { formatNumber as fmt } from '@/shared/recipe/format';
import type { ContainerNode, RecipeNode, RepeatNode, StageNode } from '@/shared/recipe/types';
import { filtersOfNode, findSlotByName, resolveFilter } from '@/shared/recipe/filters';

/** What the steps before a node (in its stage, or outside all stages) have set up. */
export interface Scope {
  stage: StageNode | null;
  /** An earlier slew to explicit RA/Dec. */
  explicitPointing: boolean;
  /** An earlier guide step. */
  guided: boolean;
}

/** Reports a finding about the node being checked. */
export type Emit = (f: Omit<RecipeFinding, 'nodeId' | 'path'>) => void;

export const stageHasPointing = (stage: StageNode | null) => stage !== null && (stage.targetId !== null || stage.framing !== undefined);

/** Checks of one enabled node in its scope (recipe.md "Static checks", trade-defaults.md rule 11). */
export function checkNode(node: RecipeNode, scope: Scope, opts: CheckOptions, emit: Emit): void {
  if (opts.rig) checkFilters(node, opts.rig, emit);
  checkPointing(node, scope, emit);
  switch (node.kind) {
    case 'stage':
      if (node.targetId === null) {
        const message = node.framing ? 'This stage points at its own framing but is not linked to a target, so its frames stay out of the target history' : 'This stage has no target';
        emit({ code: 'stage-no-target', severity: 'warn', message, fix: 'Choose a target for the stage' });
      }
      break;
    case 'repeat':
      checkRepeat(node, scope, emit);
      break;
    case 'cool':
      checkSetpoint(node.setpointC, opts, emit);
      break;
    case 'rotate':
      if (opts.rig && !opts.rig.rotator.present) emit({ code: 'no-rotator', severity: 'stop', message: `${opts.rig.name} has no rotator`, fix: 'Remove the rotate step, or add the rotator to the rig' });
      break;
    case 'expose':
      checkUnguided(node.exposureS, scope, opts, emit);
      break;
    case 'focus': {
      const min = opts.minFocusPoints ?? CHECK_DEFAULTS.minFocusPoints;
      if (node.points < min) emit({ code: 'focus-points-low', severity: 'warn', message: `A focus run with ${node.points} points rarely finds the best focus`, fix: `Use at least ${min} points (9 is usual)` });
      break;
    }
    case 'darks':
      emit({ code: 'darks-uncapped', severity: 'info', message: 'Darks need the optics covered: light leaking in spoils them', fix: 'Cover the optics (cap, closed roof or a dark panel) before this step runs' });
      break;
    default:
      break;
  }
  if ('children' in node) checkEmpty(node, emit);
}

function checkFilters(node: RecipeNode, rig: NonNullable<CheckOptions['rig']>, emit: Emit): void {
  for (const ref of filtersOfNode(node)) {
    if (findSlotByName(rig, ref)) continue;
    const near = resolveFilter(rig, ref);
    const fix = near ? `Use "${near.name}", the rig's ${near.band} filter` : `Choose one of ${rig.filterWheel.slots.map((s) => s.name).join(', ')}`;
    emit({ code: 'filter-missing', severity: 'stop', message: `Filter "${ref}" is not in the wheel of ${rig.name}`, fix });
  }
}

function checkPointing(node: RecipeNode, scope: Scope, emit: Emit): void {
  const needsStage =
    (node.kind === 'slew' && node.to.kind === 'stage-target') ||
    (node.kind === 'rotate' && node.to.matchFraming === true) ||
    (node.kind === 'wait' && node.until.altitudeAboveDeg !== undefined);
  const needsPointing = needsStage || node.kind === 'expose' || node.kind === 'centre' || node.kind === 'rotate';
  if (!needsPointing || stageHasPointing(scope.stage)) return;
  if (!needsStage && scope.explicitPointing) return;
  const where = scope.stage ? 'in a stage without a target' : 'outside a stage';
  const fix = scope.stage ? 'Choose a target for the stage' : needsStage ? 'Move it into a stage with a target' : 'Move it into a stage with a target, or slew to explicit coordinates first';
  emit({ code: 'no-target', severity: 'stop', message: `This ${node.kind} step is ${where} and has nothing to point at`, fix });
}

function checkRepeat(node: RepeatNode, scope: Scope, emit: Emit): void {
  const until = node.until as Partial<RepeatNode['until']> | undefined;
  const keys = until ? Object.keys(until).filter((k) => (until as Record<string, unknown>)[k] !== undefined) : [];
  const fix = 'Give the repeat an end: a count, a clock time, a sun event such as astronomical dawn, or an altitude in a stage with a target';
  const endless = (message: string) => emit({ code: 'endless-repeat', severity: 'stop', message, fix });
  if (!until || keys.length !== 1) return endless('This repeat has no end');
  if (until.count !== undefined) {
    if (!Number.isInteger(until.count) || until.count < 1) endless(`A repeat count of ${until.count} gives it no end`);
    return;
  }
  if (until.altitudeBelowDeg !== undefined && !stageHasPointing(scope.stage)) return endless('This repeat waits for a target to sink, but it is not in a stage with a target');
  if (!hasTimedStep(node)) endless('Nothing inside this repeat takes time, so its clock never moves toward the end');
}

/** True when an enabled step other than a note lies inside. */
function hasTimedStep(node: ContainerNode): boolean {
  return node.children.some((c) => c.enabled && ('children' in c ? hasTimedStep(c) : c.kind !== 'note'));
}

function checkSetpoint(setpointC: number, opts: CheckOptions, emit: Emit): void {
  if (!opts.rig || !opts.site) return;
  const reachable = opts.site.duskTempC - opts.rig.camera.cooling.maxDeltaBelowAmbientC;
  if (setpointC >= reachable) return;
  emit({
    code: 'setpoint-unreachable',
    severity: 'warn',
    message: `${fmt(setpointC)} °C is below what the camera reaches at dusk: ${fmt(opts.site.duskTempC)} °C ambient − ${fmt(opts.rig.camera.cooling.maxDeltaBelowAmbientC)} °C = ${fmt(reachable)} °C`,
    fix: `Set the set-point to ${fmt(Math.ceil(reachable))} °C or warmer`,
  });
}

function checkUnguided(exposureS: number, scope: Scope, opts: CheckOptions, emit: Emit): void {
  const limit = opts.unguidedLimitS ?? CHECK_DEFAULTS.unguidedLimitS;
  if (scope.guided || exposureS <= limit) return;
  const noGuider = opts.rig && !opts.rig.guider.present;
  emit({
    code: 'unguided-long',
    severity: 'warn',
    message: `${fmt(exposureS)} s subs with no guide step before them in this ${scope.stage ? 'stage' : 'recipe'}; unguided subs beyond ${limit} s often trail`,
    fix: noGuider ? `Keep subs at or below ${limit} s, or add a guider to the rig` : `Add a guide step before it, or keep subs at or below ${limit} s`,
  });
}

function checkEmpty(node: ContainerNode, emit: Emit): void {
  if (node.children.length === 0) emit({ code: 'empty-container', severity: 'warn', message: `This ${node.kind} is empty`, fix: `Add steps to the ${node.kind} or remove it` });
  else if (node.children.every((c) => !c.enabled)) emit({ code: 'empty-container', severity: 'warn', message: `Every step in this ${node.kind} is switched off`, fix: `Switch a step on or remove the ${node.kind}` });
}
