import type { Sim } from '@/shared/dry-run/engine/state';
import type { DryRunTotals } from '@/shared/dry-run/types';

const round1 = (x: number) => Math.round(x * 10) / 10;

/**
 * Totals of a run (trade-defaults.md rules 9 and 10). Elapsed time runs from the first event that
 * is not a wait (idling before the first step is not the rig's time) to the last event's end;
 * it equals shutter-open time + every overhead + idle time, since every moment of the run is
 * one event. Efficiency = shutter-open ÷ elapsed (65–90 % typical).
 */
export function buildTotals(sim: Sim): DryRunTotals {
  const timeline = sim.out.timeline;
  const first = timeline.find((e) => e.kind !== 'wait');
  const last = timeline[timeline.length - 1];
  const startMs = first ? Date.parse(first.start) : null;
  const endMs = last ? Date.parse(last.end) : null;
  let idleMs = 0;
  for (const e of timeline) {
    if ((e.kind === 'wait' || e.kind === 'pause') && startMs !== null && Date.parse(e.start) >= startMs) idleMs += Date.parse(e.end) - Date.parse(e.start);
  }
  const elapsedS = startMs !== null && endMs !== null ? (endMs - startMs) / 1000 : 0;
  const integration: DryRunTotals['integrationByTargetAndFilter'] = {};
  for (const [target, byFilter] of sim.out.integration) {
    integration[target] = Object.fromEntries([...byFilter].map(([f, t]) => [f, { frames: t.frames, seconds: round1(t.seconds) }]));
  }
  return {
    integrationByTargetAndFilter: integration,
    overheadByKind: Object.fromEntries(Object.entries(sim.out.overhead).map(([k, s]) => [k, round1(s)])),
    idleS: round1(idleMs / 1000),
    shutterOpenS: round1(sim.out.shutterS),
    usableShutterS: round1(sim.out.usableS),
    elapsedS: round1(elapsedS),
    efficiency: elapsedS > 0 ? Math.round((sim.out.shutterS / elapsedS) * 1000) / 1000 : 0,
    stageFinish: sim.out.stageFinish,
    nightEnd: endMs === null ? null : new Date(endMs).toISOString(),
    dawn: sim.sky.night.astronomicalDawn,
    slackBeforeFixed: sim.out.slack,
  };
}
