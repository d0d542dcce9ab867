import { effectiveMinAltitudeDeg, horizonAltitudeAt } from '@/shared/horizon/profile';
import type { FilterBand } from '@/shared/rig/schema';
import { ambientTempC, reachableSetpointC } from '@/shared/dry-run/models/cooling';
import { isNarrowband, requiredMoonSeparationDeg } from '@/shared/dry-run/models/moon-avoidance';
import { firstWhere } from '@/shared/dry-run/sky/search';
import { pointingAltAz } from '@/shared/dry-run/engine/pointing';
import type { Scope } from '@/shared/dry-run/engine/scope';
import type { Sim } from '@/shared/dry-run/engine/state';
import { checkPointingSun } from '@/shared/dry-run/engine/sun-checks';
import { hhmm, n } from '@/shared/dry-run/engine/text';

/** Darkness per band (trade-defaults.md "darkness": broadband Sun < −18° (S28), narrowband < −12°). */
const DARK_DEG = { broadband: -18, narrowband: -12 } as const;
/** Six degrees brighter than a band's darkness (one twilight stage) the frames are a stop. */
const STOP_ABOVE_DARK_DEG = 6;
const SAMPLE_MS = 10 * 60_000;

/** Sample instants across a block: both ends and every 10 minutes between. */
function samples(startMs: number, endMs: number): number[] {
  const out = [startMs];
  for (let ms = startMs + SAMPLE_MS; ms < endMs; ms += SAMPLE_MS) out.push(ms);
  if (endMs > startMs) out.push(endMs);
  return out;
}

/**
 * Sky checks of a block of light frames from `startMs` to `endMs`: daylight by band, the Moon,
 * the Sun, the altitude (for pointing outside a stage's own limits) and cooling. True when the
 * block raised nothing, i.e. its frames count as usable.
 */
export function checkLightBlock(sim: Sim, scope: Scope, nodeId: string, band: FilterBand, startMs: number, endMs: number): boolean {
  const at = samples(startMs, endMs);
  let clean = checkDaylight(sim, nodeId, band, startMs, endMs);
  clean = checkMoon(sim, scope, nodeId, band, at) && clean;
  clean = at.every((ms) => checkPointingSun(sim, nodeId, ms)) && clean;
  if (!scope.stage || sim.pointing.kind !== 'radec' || sim.pointing.sky !== scope.stage.sky) clean = checkAltitude(sim, nodeId, at) && clean;
  checkCooling(sim, nodeId, endMs);
  return clean;
}

/**
 * `daylight`: the Sun above the band's darkness at any time of the block (its altitude in a
 * night is lowest at solar midnight, so the brightest moment of a block is one of its ends).
 * Warn up to 6° above the limit, stop beyond. With no astronomical darkness tonight,
 * broadband falls back to −12° with a warning (rule 7).
 */
function checkDaylight(sim: Sim, nodeId: string, band: FilterBand, startMs: number, endMs: number): boolean {
  const narrow = isNarrowband(band);
  let limit: number = narrow ? DARK_DEG.narrowband : DARK_DEG.broadband;
  if (!narrow && sim.sky.night.darkStart === null) {
    limit = DARK_DEG.narrowband;
    sim.out.finding({ code: 'daylight', severity: 'warn', ms: null, nodeId: null, key: 'daylight|no-dark', message: 'The Sun never gets below −18° tonight: broadband frames are judged against −12° instead', fix: 'Expect brighter skies; narrowband filters suit nights without astronomical darkness' });
  }
  const sun = (ms: number) => sim.sky.sun.altAz(ms).altDeg;
  const worst = Math.max(sun(startMs), sun(endMs));
  if (worst < limit) return true;
  const first = firstWhere(startMs, endMs, SAMPLE_MS, (ms) => sun(ms) >= limit) ?? startMs;
  const severity = worst >= limit + STOP_ABOVE_DARK_DEG ? 'stop' : 'warn';
  sim.out.finding({ code: 'daylight', severity, ms: first, nodeId, message: `${narrow ? 'Narrowband' : 'Broadband'} frames run at ${hhmm(sim, first)} with the Sun at ${n(sun(first))}° (up to ${n(worst)}°); ${narrow ? 'narrowband' : 'broadband'} needs the Sun below ${n(limit)}°`, fix: 'Start the frames after the darkness begins and end them before it ends, or use a narrowband filter in twilight' });
  return false;
}

/**
 * `moon-near`: the Moon above the horizon closer than D / (1 + (age/W)²) for the band
 * (moon-avoidance.ts), or than the stage's own minimum separation; the stage's largest Moon
 * illumination is checked while the Moon is up.
 */
function checkMoon(sim: Sim, scope: Scope, nodeId: string, band: FilterBand, at: number[]): boolean {
  if (sim.pointing.kind !== 'radec') return true;
  const target = sim.pointing.sky.vectorOfDate();
  const w = scope.stage?.node.window;
  const params = isNarrowband(band) ? sim.opts.moon.narrowband : sim.opts.moon.broadband;
  const required = w?.minMoonSeparationDeg ?? requiredMoonSeparationDeg(sim.sky.moonDaysFromFull, params);
  const illumPct = sim.sky.night.moonIllumination * 100;
  for (const ms of at) {
    if (sim.sky.moon.altAz(ms).altDeg <= 0) continue;
    const sep = sim.sky.moon.separationDeg(target, ms);
    if (sep < required) {
      sim.out.finding({ code: 'moon-near', severity: 'warn', ms, nodeId, message: `At ${hhmm(sim, ms)} the Moon (${Math.round(illumPct)} % lit) is ${n(sep)}° away; ${isNarrowband(band) ? 'narrowband' : 'broadband'} frames want ${n(required)}°`, fix: 'Image this filter when the Moon is down or farther away, or switch to narrowband while the Moon is up' });
      return false;
    }
    if (w?.maxMoonIlluminationPct !== undefined && illumPct > w.maxMoonIlluminationPct) {
      sim.out.finding({ code: 'moon-near', severity: 'warn', ms, nodeId, message: `The Moon is up and ${Math.round(illumPct)} % lit; the stage allows ${n(w.maxMoonIlluminationPct)} %`, fix: 'Move the stage to when the Moon is down, or to a darker night' });
      return false;
    }
  }
  return true;
}

/** Altitude of frames at a pointing the stage's limits do not guard: below the horizon is a stop, below the minimum altitude a warning. */
function checkAltitude(sim: Sim, nodeId: string, at: number[]): boolean {
  for (const ms of at) {
    const { altDeg, azDeg } = pointingAltAz(sim, sim.pointing, ms);
    const horizon = horizonAltitudeAt({ points: sim.site.horizon }, azDeg);
    if (altDeg < horizon) {
      sim.out.finding({ code: 'below-horizon', severity: 'stop', ms, nodeId, message: `At ${hhmm(sim, ms)} the frames point at ${n(altDeg)}°, below the horizon (${n(horizon)}° there)`, fix: 'Take these frames when the position is above the site horizon' });
      return false;
    }
    const limit = effectiveMinAltitudeDeg({ points: sim.site.horizon }, azDeg, sim.site.minAltitudeDeg);
    if (altDeg < limit) {
      sim.out.finding({ code: 'low-altitude', severity: 'warn', ms, nodeId, message: `At ${hhmm(sim, ms)} the frames point at ${n(altDeg)}°, below the minimum altitude of ${n(limit)}°`, fix: 'Take them higher in the sky, or put them in a stage whose window keeps the target high' });
      return false;
    }
  }
  return true;
}

/** `not-cooled`: lights with a cooled camera whose set-point the cooler can no longer hold as the air warms. */
function checkCooling(sim: Sim, nodeId: string, ms: number): void {
  const cooling = sim.rig.camera.cooling;
  if (!sim.cooled || sim.setpointC === null || cooling.maxDeltaBelowAmbientC === 0) return;
  const floor = reachableSetpointC(ambientTempC(sim.sky.ambient, ms), cooling.maxDeltaBelowAmbientC);
  if (sim.setpointC >= floor - 1e-9) return;
  sim.out.finding({ code: 'not-cooled', severity: 'warn', ms, nodeId, key: `not-cooled|hold|${nodeId}`, message: `By ${hhmm(sim, ms)} the camera can no longer hold ${n(sim.setpointC)} °C: ambient − ${n(cooling.maxDeltaBelowAmbientC)} °C is ${n(floor)} °C`, fix: 'Choose a warmer set-point for the whole night (and darks at that temperature)' });
}
