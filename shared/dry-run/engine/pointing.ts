import { airmassKastenYoung } from '@/shared/ephemeris/atmosphere';
import { horizonVector, type Vec3 } from '@/shared/dry-run/models/slew-path';
import { skyPositionAngleDeg } from '@/shared/dry-run/models/rotate';
import type { MountPosition, PierSide } from '@/shared/dry-run/models/slew';
import type { Pointing, Sim } from '@/shared/dry-run/engine/state';

const RAD = Math.PI / 180;
const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** Hour angle (h) and declination (°) of a fixed horizontal direction (Meeus ch. 13, inverted). */
export function altAzToHaDec(altDeg: number, azDeg: number, latitudeDeg: number): { haH: number; decDeg: number } {
  const [h, a, phi] = [altDeg * RAD, azDeg * RAD, latitudeDeg * RAD];
  const sinDec = Math.sin(phi) * Math.sin(h) + Math.cos(phi) * Math.cos(h) * Math.cos(a);
  const ha = Math.atan2(-Math.sin(a) * Math.cos(h), Math.cos(phi) * Math.sin(h) - Math.sin(phi) * Math.cos(h) * Math.cos(a));
  return { haH: ha / RAD / 15, decDeg: Math.asin(Math.max(-1, Math.min(1, sinDec))) / RAD };
}

/** Apparent altitude and azimuth of a pointing at an instant. */
export function pointingAltAz(sim: Sim, p: Pointing, ms: number): { altDeg: number; azDeg: number } {
  if (p.kind === 'radec') return p.sky.altAz(ms);
  if (p.kind === 'altaz') return { altDeg: p.altDeg, azDeg: p.azDeg };
  return { altDeg: sim.rig.mount.park.altDeg, azDeg: sim.rig.mount.park.azDeg };
}

/** Where the mount's axes must go for a pointing (for the slew model). */
export function mountPosition(sim: Sim, p: Pointing, ms: number): MountPosition {
  const { altDeg, azDeg } = pointingAltAz(sim, p, ms);
  if (p.kind === 'radec') return { haH: p.sky.hourAngleH(ms), decDeg: p.sky.decDateDeg, altDeg, azDeg };
  const { haH, decDeg } = altAzToHaDec(altDeg, azDeg, sim.site.latitudeDeg);
  return { haH, decDeg, altDeg, azDeg, park: p.kind === 'park' };
}

/**
 * The pier side a German mount takes for a pointing: tube west of the pier (looking east)
 * before the meridian, east of it from the meridian on. Other mounts: null.
 */
export function pierFor(sim: Sim, p: Pointing, ms: number): PierSide | null {
  if (sim.rig.mount.type !== 'german-equatorial') return null;
  if (p.kind === 'park') return null;
  return mountPosition(sim, p, ms).haH < 0 ? 'west' : 'east';
}

/** Horizontal unit vector of a pointing (for the Sun-path check). */
export function pointingVector(sim: Sim, p: Pointing, ms: number): Vec3 {
  const { altDeg, azDeg } = pointingAltAz(sim, p, ms);
  return horizonVector(altDeg, azDeg);
}

/** The camera's sky position angle now; null when unknown (parked, alt-az mount). */
export function currentSkyPaDeg(sim: Sim): number | null {
  if (sim.pointing.kind === 'park' || sim.rig.mount.type === 'alt-az') return null;
  const mech = sim.rig.rotator.present ? sim.rotatorDeg : 0;
  return round(skyPositionAngleDeg(mech, sim.rig.rotator.skyOffsetDeg, sim.pier), 2);
}

/** The pointing fields of a timeline event at `ms`. */
export function pointingFields(sim: Sim, ms: number) {
  const p = sim.pointing;
  const { altDeg, azDeg } = pointingAltAz(sim, p, ms);
  const radec = p.kind === 'radec';
  return {
    altDeg: round(altDeg, 2),
    azDeg: round(azDeg, 2),
    hourAngleH: radec ? round(p.sky.hourAngleH(ms), 4) : null,
    pierSide: sim.pier,
    airmass: altDeg > 0 ? round(airmassKastenYoung(altDeg), 3) : null,
    moonSepDeg: radec ? round(sim.sky.moon.separationDeg(p.sky.vectorOfDate(), ms), 1) : null,
    skyPaDeg: currentSkyPaDeg(sim),
    targetId: radec ? p.targetId : null,
  };
}
