import type { Sim } from '@/shared/dry-run/engine/state';
import { hhmm } from '@/shared/dry-run/engine/text';
import type { TimelineKind } from '@/shared/dry-run/types';

/** Steps that may run after dawn without overrunning the night: calibration, warm-up, park, idling. */
const AFTER_DAWN_OK: readonly TimelineKind[] = ['flats', 'darks', 'park', 'warm', 'wait', 'pause'];

/**
 * Findings about the night as a whole, after the run: `past-dawn` for the first imaging step
 * that ends after astronomical dawn and for a rig left unparked (or parked after sunrise with
 * no dawn flats: rule 8); `not-cooled` (info) for a camera never warmed up (rule 3).
 */
export function finishFindings(sim: Sim): void {
  const night = sim.sky.night;
  const dawnMs = night.astronomicalDawn ? Date.parse(night.astronomicalDawn) : sim.sky.darkEndMs;
  const timeline = sim.out.timeline;
  const late = timeline.find((e) => !AFTER_DAWN_OK.includes(e.kind) && Date.parse(e.end) > dawnMs);
  if (late) {
    const ms = Date.parse(late.end);
    sim.out.finding({ code: 'past-dawn', severity: 'warn', ms, nodeId: late.nodeId, key: 'past-dawn|late', message: `The plan runs past astronomical dawn (${hhmm(sim, dawnMs)}): "${late.what}" ends at ${hhmm(sim, ms)}`, fix: 'End the last stage by astronomical dawn (window end) or take fewer frames' });
  }
  if (timeline.length > 0) checkPark(sim);
  if (sim.cooled) {
    sim.out.finding({ code: 'not-cooled', severity: 'info', ms: sim.t, nodeId: null, key: 'not-cooled|warm', message: 'The camera is still cooled when the recipe ends', fix: 'Add a warm step before parking: warming slowly protects the sensor from condensation' });
  }
}

function checkPark(sim: Sim): void {
  const timeline = sim.out.timeline;
  const sunrise = sim.sky.night.sunrise ? Date.parse(sim.sky.night.sunrise) : null;
  if (sim.pointing.kind !== 'park') {
    sim.out.finding({ code: 'past-dawn', severity: 'warn', ms: sim.t, nodeId: null, key: 'past-dawn|unparked', message: 'The recipe ends without parking the mount: it would track into the day', fix: 'End the recipe with a park step' });
    return;
  }
  const park = [...timeline].reverse().find((e) => e.kind === 'park');
  if (!park || sunrise === null || sim.out.dawnSkyFlats || Date.parse(park.end) <= sunrise) return;
  sim.out.finding({ code: 'past-dawn', severity: 'warn', ms: Date.parse(park.end), nodeId: park.nodeId, key: 'past-dawn|park', message: `The mount parks at ${hhmm(sim, Date.parse(park.end))}, after sunrise (${hhmm(sim, sunrise)})`, fix: 'Park before dawn unless dawn flats are planned: end the last stage earlier' });
}
