import { angleDeg, pathClosestApproachDeg, type Vec3 } from '@/shared/dry-run/models/slew-path';
import { horizonVector } from '@/shared/dry-run/models/slew-path';
import { pointingVector } from '@/shared/dry-run/engine/pointing';
import type { Pointing, Sim } from '@/shared/dry-run/engine/state';
import { hhmm, n } from '@/shared/dry-run/engine/text';

/** The Sun counts as up above −0.8333° (its upper limb with refraction: USNO sunrise/sunset). */
export const SUN_UP_DEG = -0.8333;
/** Slew only with the Sun below −4° unless sky flats are planned (trade-defaults.md "safety", S31). */
export const SLEW_SUN_LIMIT_DEG = -4;

function sunVector(sim: Sim, ms: number): { alt: number; vec: Vec3 } {
  const { altDeg, azDeg } = sim.sky.sun.altAz(ms);
  return { alt: altDeg, vec: horizonVector(altDeg, azDeg) };
}

/**
 * Sun safety of a slew path (waypoints at the slew's start): a path within the avoidance angle
 * while the Sun is up is a stop; a slew with the Sun above −4° is a warning unless the
 * container plans sky flats.
 */
export function checkSlewSun(sim: Sim, waypoints: Vec3[], nodeId: string | null, skyFlats: boolean): void {
  const sun = sunVector(sim, sim.t);
  if (sun.alt > SUN_UP_DEG) {
    const closest = pathClosestApproachDeg(waypoints, sun.vec);
    if (closest < sim.opts.sunAvoidanceDeg) {
      sim.out.finding({ code: 'sun-near', severity: 'stop', ms: sim.t, nodeId, key: `sun-near|slew|${nodeId}`, message: `At ${hhmm(sim, sim.t)} this slew passes ${n(closest)}° from the Sun, inside the ${n(sim.opts.sunAvoidanceDeg)}° avoidance angle`, fix: 'Move the step after sunset, or slew by another route; never point near the Sun' });
      return;
    }
  }
  if (sun.alt > SLEW_SUN_LIMIT_DEG && !skyFlats) {
    sim.out.finding({ code: 'sun-near', severity: 'warn', ms: sim.t, nodeId, key: `sun-near|bright|${nodeId}`, message: `This slew runs at ${hhmm(sim, sim.t)} with the Sun at ${n(sun.alt)}°; slew only with the Sun below ${n(SLEW_SUN_LIMIT_DEG)}° unless taking sky flats`, fix: 'Start the recipe later, e.g. wait for civil dusk' });
  }
}

/** The path of a slew between two pointings, both taken at the slew's start. */
export function slewWaypoints(sim: Sim, from: Pointing, to: Pointing): Vec3[] {
  return [pointingVector(sim, from, sim.t), pointingVector(sim, to, sim.t)];
}

/** Stop when a pointing sits within the avoidance angle of the Sun while it is up, at `ms`. */
export function checkPointingSun(sim: Sim, nodeId: string | null, ms: number): boolean {
  const sun = sunVector(sim, ms);
  if (sun.alt <= SUN_UP_DEG) return true;
  const sep = angleDeg(pointingVector(sim, sim.pointing, ms), sun.vec);
  if (sep >= sim.opts.sunAvoidanceDeg) return true;
  sim.out.finding({ code: 'sun-near', severity: 'stop', ms, nodeId, key: `sun-near|point|${nodeId}`, message: `At ${hhmm(sim, ms)} the telescope points ${n(sep)}° from the Sun, inside the ${n(sim.opts.sunAvoidanceDeg)}° avoidance angle`, fix: 'Image this after sunset, or choose a target far from the Sun' });
  return false;
}
