import { formatDurationS, formatList, formatNumber as n, formatWhen } from '@/shared/recipe/format';
import type { NodeOf, RecipeNode } from '@/shared/recipe/types';
import { formatDec, formatRa } from '@/shared/targets/coordinates';

export { targetIds, totals, type FrameTotal, type RecipeTotals } from '@/shared/recipe/totals';

export interface SummaryOptions {
  /** A target's display name by id (e.g. "M31"); without it a stage says "Target". */
  targetName?: (id: string) => string | undefined;
}

const plural = (count: number, one: string, many = `${one}s`) => `${count} ${count === 1 ? one : many}`;
const rate = (r: number | undefined) => (r === undefined ? '' : ` at ${n(r)} °C/min`);
const radec = (ra: number, dec: number) => `RA ${formatRa(ra, { style: 'hms', decimals: 0 })}, Dec ${formatDec(dec, { style: 'dms' })}`;

/**
 * One line in the trade's words for any node, e.g. "Ha 10 × 300 s, gain 100, bin 1, dither
 * every 2" or "M31 · after astronomical dusk · above 30°". The node's label is not included.
 */
export function summarizeNode(node: RecipeNode, opts: SummaryOptions = {}): string {
  switch (node.kind) {
    case 'stage':
      return summarizeStage(node, opts);
    case 'repeat':
      return summarizeRepeat(node);
    case 'group':
      return `Group of ${plural(node.children.length, 'step')}`;
    case 'cool':
      return `Cool to ${n(node.setpointC)} °C${rate(node.maxRateCPerMin)}`;
    case 'warm':
      return `Warm to ${node.targetC === undefined ? 'ambient' : `${n(node.targetC)} °C`}${rate(node.maxRateCPerMin)}`;
    case 'slew':
      if (node.to.kind === 'stage-target') return 'Slew to the stage target';
      if (node.to.kind === 'radec') return `Slew to ${radec(node.to.raDeg, node.to.decDeg)}`;
      return `Slew to alt ${n(node.to.altDeg)}°, az ${n(node.to.azDeg)}°`;
    case 'centre':
      return `Centre within ${n(node.toleranceArcsec)}″, up to ${plural(node.maxAttempts, 'try', 'tries')}${node.filter ? ` with ${node.filter}` : ''}`;
    case 'rotate':
      return `${node.to.matchFraming ? 'Rotate to match the framing' : `Rotate to PA ${n(node.to.positionAngleDeg ?? 0)}°`} within ${n(node.toleranceArcmin)}′`;
    case 'focus':
      return `Focus${node.filter ? ` with ${node.filter}` : ''}: ${node.points} points × ${n(node.exposureS)} s, ${plural(node.stepSize, 'step')} apart`;
    case 'expose':
      return summarizeExpose(node);
    case 'guide':
      return `Guide, settle within ${n(node.settlePx)} px for ${n(node.settleTimeS)} s${node.calibrate ? ', calibrate first' : ''}`;
    case 'meridian':
      return summarizeMeridian(node);
    case 'wait':
      return summarizeWait(node);
    case 'flats':
      return summarizeFlats(node);
    case 'darks':
      return summarizeDarks(node);
    case 'park':
      return 'Park the mount';
    case 'note': {
      const line = node.text.split('\n')[0] ?? '';
      return line.length > 60 ? `${line.slice(0, 59)}…` : line;
    }
  }
}

function summarizeStage(node: NodeOf<'stage'>, opts: SummaryOptions): string {
  const name = node.targetId !== null ? (opts.targetName?.(node.targetId) ?? 'Target') : node.framing ? radec(node.framing.raDeg, node.framing.decDeg) : 'No target';
  const w = node.window;
  const parts = [name];
  if (node.targetId !== null && node.framing) parts.push(`own framing, PA ${n(node.framing.positionAngleDeg)}°`);
  if (w.notBefore !== undefined) parts.push(`after ${formatWhen(w.notBefore)}`);
  if (w.endBy !== undefined) parts.push(`end by ${formatWhen(w.endBy)}`);
  if (w.minAltitudeDeg !== undefined) parts.push(`above ${n(w.minAltitudeDeg)}°`);
  if (w.maxMoonIlluminationPct !== undefined) parts.push(`Moon ≤ ${n(w.maxMoonIlluminationPct)} %`);
  if (w.minMoonSeparationDeg !== undefined) parts.push(`≥ ${n(w.minMoonSeparationDeg)}° from the Moon`);
  return parts.join(' · ');
}

function summarizeRepeat(node: NodeOf<'repeat'>): string {
  const u = node.until;
  if (u.count !== undefined) return u.count === 1 ? 'Repeat once' : `Repeat ${u.count} times`;
  if (u.clock !== undefined) return `Repeat until ${formatWhen(u.clock)}`;
  if (u.altitudeBelowDeg !== undefined) return `Repeat until the target sinks below ${n(u.altitudeBelowDeg)}°`;
  return `Repeat until ${formatWhen(u.sunEvent ?? '')}`;
}

function summarizeExpose(node: NodeOf<'expose'>): string {
  const parts = [`${node.filter} ${node.count} × ${n(node.exposureS)} s`];
  if (node.gain !== undefined) parts.push(`gain ${n(node.gain)}`);
  if (node.offset !== undefined) parts.push(`offset ${n(node.offset)}`);
  parts.push(`bin ${node.binning}`);
  parts.push(node.ditherEvery === 0 ? 'no dither' : node.ditherEvery === 1 ? 'dither every frame' : `dither every ${node.ditherEvery}`);
  return parts.join(', ');
}

function summarizeMeridian(node: NodeOf<'meridian'>): string {
  const p = node.policy;
  if (p.kind === 'pause-before') return `Pause ${n(p.minutesBefore)} min before the meridian`;
  if (p.kind === 'end-stage') return 'End the stage at the meridian';
  const after = [p.recentre ? 'recentre' : '', p.refocus ? 'refocus' : ''].filter(Boolean);
  return `Flip ${n(p.flipAfterMin)} min past the meridian${after.length ? `, then ${after.join(' and ')}` : ''}`;
}

function summarizeWait(node: NodeOf<'wait'>): string {
  const u = node.until;
  if (u.durationS !== undefined) return `Wait ${formatDurationS(u.durationS)}`;
  if (u.altitudeAboveDeg !== undefined) return `Wait until the target is above ${n(u.altitudeAboveDeg)}°`;
  return `Wait until ${formatWhen(u.clock ?? u.sunEvent ?? '')}`;
}

function summarizeFlats(node: NodeOf<'flats'>): string {
  const level = node.targetAduPct === undefined ? '' : ` at ${n(node.targetAduPct)} %`;
  const match = node.matchFramingOf ? `, ${matchText(node.matchFramingOf)}` : '';
  return `${node.source === 'sky' ? 'Sky' : 'Panel'} flats: ${formatList(node.filters)}, ${node.count} each${level}${match}`;
}

/** "matching a stage's framing", "matching a recorded framing" or "at rotator 123.4°, focuser 15200". */
function matchText(m: NonNullable<NodeOf<'flats'>['matchFramingOf']>): string {
  if (m.kind === 'stage') return "matching a stage's framing";
  if (m.kind === 'framing') return 'matching a recorded framing';
  const at = [m.rotatorAngleDeg === undefined ? '' : `rotator ${n(m.rotatorAngleDeg)}°`, m.focuserPositionSteps === undefined ? '' : `focuser ${m.focuserPositionSteps}`].filter(Boolean);
  return `at ${at.join(', ')}`;
}

function summarizeDarks(node: NodeOf<'darks'>): string {
  const parts = [`Darks ${node.count} × ${formatList(node.exposuresS.map((s) => `${n(s)} s`))} at ${n(node.temperatureC)} °C`];
  if (node.gain !== undefined) parts.push(`gain ${n(node.gain)}`);
  if (node.offset !== undefined) parts.push(`offset ${n(node.offset)}`);
  parts.push(`bin ${node.binning}`);
  return parts.join(', ');
}
