import { type AstroTime, Body, Illumination, MoonPhase, SearchAltitude, SearchRiseSet } from 'astronomy-engine';
import type { Night } from '@/shared/schemas/night';
import { moonAltitudeDeg, observerAt, sunAltitudeDeg, type SiteLocation } from '@/shared/ephemeris/sky';
import { addDaysYmd, zonedWallTimeToUtc } from '@/shared/time';

/** A site as the night needs it: where it is and which clock it lives by. */
export interface NightSite extends SiteLocation {
  timeZone: string;
}

const DAY_MS = 86_400_000;
const HOUR_MS = 3_600_000;
const SAMPLE_STEP_MS = 10 * 60_000;

/** Sun-centre altitudes of the twilight limits (USNO "Rise, Set, and Twilight Definitions"), geometric. */
export const TWILIGHT_ALTITUDE_DEG = { civil: -6, nautical: -12, astronomical: -18 } as const;

type Instant = number | null;

const toMs = (t: AstroTime | null): Instant => (t ? Math.round(t.date.getTime() / 1000) * 1000 : null);
const toIso = (ms: Instant): string | null => (ms === null ? null : new Date(ms).toISOString());
const round = (x: number, digits: number): number => Math.round(x * 10 ** digits) / 10 ** digits;

/**
 * The longest stretch of the span with the Sun below −18°, from the first descending and first
 * ascending crossing found and whether the span starts and ends dark. Handles polar night
 * (dark throughout: the whole span) and never-dark nights (null).
 */
export function darknessWindow(
  spanStartMs: number,
  spanEndMs: number,
  duskMs: Instant,
  dawnMs: Instant,
  darkAtStart: boolean,
): [number, number] | null {
  const crossings = [
    ...(duskMs === null ? [] : [{ ms: duskMs, dark: true }]),
    ...(dawnMs === null ? [] : [{ ms: dawnMs, dark: false }]),
  ].sort((a, b) => a.ms - b.ms);
  const windows: [number, number][] = [];
  let dark = darkAtStart;
  let from = spanStartMs;
  for (const c of crossings) {
    if (dark && !c.dark) windows.push([from, c.ms]);
    if (!dark && c.dark) from = c.ms;
    dark = c.dark;
  }
  if (dark) windows.push([from, spanEndMs]);
  let best: [number, number] | null = null;
  for (const w of windows) if (!best || w[1] - w[0] > best[1] - best[0]) best = w;
  return best;
}

/** Altitude samples every 10 minutes from the span's start to its end, rounded to 0.1°. */
function altitudeSamples(startMs: number, endMs: number, altitudeAt: (d: Date) => number) {
  const samples: { t: string; altDeg: number }[] = [];
  for (let ms = startMs; ms <= endMs; ms += SAMPLE_STEP_MS) {
    const d = new Date(ms);
    samples.push({ t: d.toISOString(), altDeg: round(altitudeAt(d), 1) });
  }
  return samples;
}

/**
 * The night of `dateYmd` at a site, from local noon to the next local noon in the site's zone
 * (23 or 25 hours on DST-change nights). All searches are astronomy-engine's:
 * sunset/sunrise and moonrise/moonset with `SearchRiseSet` (upper limb on the horizon with 34′
 * refraction, i.e. the Sun's centre at about −0.8333° as USNO tabulates; at an elevated site the
 * 34′ is scaled by the air density there, e.g. about 30′ at 1150 m, and the horizon is taken as
 * level, without dip); civil, nautical and astronomical dusk and dawn
 * with `SearchAltitude` at −6°, −12°, −18° (geometric, per USNO's definitions); the Moon's
 * illuminated fraction (`Illumination`) and ecliptic phase angle (`MoonPhase`) at mid-night
 * (halfway between sunset and sunrise, or the middle of the span when either is missing).
 * Events that do not happen in the span are null; instants are UTC ISO strings to the second.
 * Throws RangeError for an invalid date or time zone.
 */
export function computeNight(site: NightSite, dateYmd: string): Night {
  const spanStartMs = zonedWallTimeToUtc(dateYmd, 12, 0, site.timeZone).getTime();
  const spanEndMs = zonedWallTimeToUtc(addDaysYmd(dateYmd, 1), 12, 0, site.timeZone).getTime();
  const spanStart = new Date(spanStartMs);
  const limitDays = (spanEndMs - spanStartMs) / DAY_MS;
  const observer = observerAt(site);

  const riseSet = (body: Body, direction: 1 | -1) => toMs(SearchRiseSet(body, observer, direction, spanStart, limitDays));
  const sunCrossing = (direction: 1 | -1, altitudeDeg: number) =>
    toMs(SearchAltitude(Body.Sun, observer, direction, spanStart, limitDays, altitudeDeg));

  const sunset = riseSet(Body.Sun, -1);
  const sunrise = riseSet(Body.Sun, +1);
  const civilDusk = sunCrossing(-1, TWILIGHT_ALTITUDE_DEG.civil);
  const civilDawn = sunCrossing(+1, TWILIGHT_ALTITUDE_DEG.civil);
  const nauticalDusk = sunCrossing(-1, TWILIGHT_ALTITUDE_DEG.nautical);
  const nauticalDawn = sunCrossing(+1, TWILIGHT_ALTITUDE_DEG.nautical);
  const astronomicalDusk = sunCrossing(-1, TWILIGHT_ALTITUDE_DEG.astronomical);
  const astronomicalDawn = sunCrossing(+1, TWILIGHT_ALTITUDE_DEG.astronomical);

  const darkAtStart = sunAltitudeDeg(site, spanStart) < TWILIGHT_ALTITUDE_DEG.astronomical;
  const dark = darknessWindow(spanStartMs, spanEndMs, astronomicalDusk, astronomicalDawn, darkAtStart);

  const midNightMs =
    sunset !== null && sunrise !== null && sunset < sunrise ? (sunset + sunrise) / 2 : (spanStartMs + spanEndMs) / 2;
  const midNight = new Date(midNightMs);

  return {
    date: dateYmd,
    timeZone: site.timeZone,
    spanStart: new Date(spanStartMs).toISOString(),
    spanEnd: new Date(spanEndMs).toISOString(),
    sunset: toIso(sunset),
    sunrise: toIso(sunrise),
    civilDusk: toIso(civilDusk),
    civilDawn: toIso(civilDawn),
    nauticalDusk: toIso(nauticalDusk),
    nauticalDawn: toIso(nauticalDawn),
    astronomicalDusk: toIso(astronomicalDusk),
    astronomicalDawn: toIso(astronomicalDawn),
    darkStart: toIso(dark ? dark[0] : null),
    darkEnd: toIso(dark ? dark[1] : null),
    darkHours: dark ? (dark[1] - dark[0]) / HOUR_MS : 0,
    moonrise: toIso(riseSet(Body.Moon, +1)),
    moonset: toIso(riseSet(Body.Moon, -1)),
    moonIllumination: round(Illumination(Body.Moon, midNight).phase_fraction, 4),
    moonPhaseDeg: round(MoonPhase(midNight), 2) % 360,
    sunAltitudes: altitudeSamples(spanStartMs, spanEndMs, (d) => sunAltitudeDeg(site, d)),
    moonAltitudes: altitudeSamples(spanStartMs, spanEndMs, (d) => moonAltitudeDeg(site, d)),
  };
}
