import { checkRecipe } from '@/shared/recipe/checks';
import { CHECK_DEFAULTS } from '@/shared/recipe/defaults';
import { printableIndexes, walk } from '@/shared/recipe/tree-read';
import { CENTRE_MODEL } from '@/shared/dry-run/models/centre';
import { ambientTempC } from '@/shared/dry-run/models/cooling';
import { MOON_AVOIDANCE_DEFAULTS } from '@/shared/dry-run/models/moon-avoidance';
import { initialRotatorDeg } from '@/shared/dry-run/models/rotate';
import { darksCoverage } from '@/shared/dry-run/engine/darks';
import { finishFindings } from '@/shared/dry-run/engine/finish';
import { Recorder } from '@/shared/dry-run/engine/record';
import { hasSkyFlats, type Scope } from '@/shared/dry-run/engine/scope';
import type { ResolvedOptions, Sim } from '@/shared/dry-run/engine/state';
import { buildTotals } from '@/shared/dry-run/engine/totals';
import { runList } from '@/shared/dry-run/engine/walk';
import type { NightSky } from '@/shared/dry-run/sky/night-sky';
import type { DryRunFinding, DryRunInput, DryRunResult } from '@/shared/dry-run/types';

const SEVERITY_RANK = { stop: 0, warn: 1, info: 2 } as const;

function resolveOptions(input: DryRunInput): ResolvedOptions {
  const o = input.options ?? {};
  return {
    sunAvoidanceDeg: o.sunAvoidanceDeg ?? 30,
    unguidedLimitS: o.unguidedLimitS ?? CHECK_DEFAULTS.unguidedLimitS,
    moon: { broadband: o.moonAvoidance?.broadband ?? MOON_AVOIDANCE_DEFAULTS.broadband, narrowband: o.moonAvoidance?.narrowband ?? MOON_AVOIDANCE_DEFAULTS.narrowband },
    darkValidityMonths: input.darkValidityMonths ?? 6,
  };
}

function nodePaths(input: DryRunInput): Map<string, string> {
  const paths = new Map<string, string>();
  walk(input.tree, (node, info) => {
    if (!paths.has(node.id)) paths.set(node.id, printableIndexes(info.indexes));
  });
  return paths;
}

/** The static checks of the recipe (recipe.md "Static checks") as dry-run findings without a time. */
export function staticFindings(input: DryRunInput): DryRunFinding[] {
  const opts = { rig: input.rig, site: input.site, unguidedLimitS: input.options?.unguidedLimitS };
  return checkRecipe(input.tree, opts).map((f) => ({ code: f.code, severity: f.severity, time: null, nodeId: f.nodeId, path: f.path, message: f.message, fix: f.fix }));
}

/** Static findings merged in (dropped where the run raised the same code on the same node), sorted by severity, then time. */
function mergeFindings(fromStatic: DryRunFinding[], fromRun: DryRunFinding[]): DryRunFinding[] {
  const ran = new Set(fromRun.map((f) => `${f.code}|${f.nodeId}`));
  const all = [...fromStatic.filter((f) => !ran.has(`${f.code}|${f.nodeId}`)), ...fromRun];
  return all.sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] || (a.time ?? '').localeCompare(b.time ?? '') || (a.path ?? '').localeCompare(b.path ?? ''));
}

/**
 * Plays a recipe against a prepared night sky. The clock starts at `startTime`, else sunset
 * (else the span's start), with the mount parked, the camera at ambient and no filter.
 */
export function runWithSky(input: DryRunInput, sky: NightSky, fromStatic: DryRunFinding[] = staticFindings(input)): DryRunResult {
  const paths = nodePaths(input);
  const night = sky.night;
  const startMs = input.startTime ? Date.parse(input.startTime) : night.sunset ? Date.parse(night.sunset) : sky.spanStartMs;
  const sim: Sim = {
    input,
    rig: input.rig,
    site: input.site,
    sky,
    opts: resolveOptions(input),
    paths,
    out: new Recorder(paths),
    t: startMs,
    pointing: { kind: 'park' },
    pier: null,
    rotatorDeg: initialRotatorDeg(input.rig.rotator),
    filter: undefined,
    sensorC: ambientTempC(sky.ambient, startMs),
    cooled: false,
    setpointC: null,
    guiding: false,
    guideSettleS: input.rig.guider.settleTimeS,
    lastFocus: null,
    lastCentreMs: null,
    pointingErrorArcsec: CENTRE_MODEL.slewErrorArcsec,
    framesSinceDither: 0,
  };
  const root: Scope = { stage: null, rules: [], deadlines: [{ ownerId: 'night', reason: 'night', at: () => sky.spanEndMs }], openEnded: false, skyFlats: hasSkyFlats(input.tree.children) };
  runList(sim, input.tree.children, root);
  finishFindings(sim);
  const darksNeeded = darksCoverage(sim);
  return {
    timeline: sim.out.timeline,
    findings: mergeFindings(fromStatic, sim.out.findings),
    totals: buildTotals(sim),
    sky: { ...night, moonDaysFromFull: Math.round(sky.moonDaysFromFull * 100) / 100 },
    darksNeeded,
  };
}
