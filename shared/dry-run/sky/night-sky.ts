import { computeNight } from '@/shared/ephemeris/night';
import { observerAt } from '@/shared/ephemeris/sky';
import { isSunEvent, type SunEvent } from '@/shared/recipe/fields';
import type { Night } from '@/shared/schemas/night';
import { addDaysYmd, zonedWallTimeToUtc } from '@/shared/time';
import type { TemperatureCurve } from '@/shared/dry-run/models/cooling';
import { daysFromFullMoon } from '@/shared/dry-run/models/moon-avoidance';
import { MoonSky, SunSky } from '@/shared/dry-run/sky/sun-moon';
import { SkyEnv, TargetSky } from '@/shared/dry-run/sky/target-sky';
import type { DryRunSite } from '@/shared/dry-run/types';

/** Everything the dry run asks of one night's sky, computed once and cached per target. */
export interface NightSky {
  night: Night;
  env: SkyEnv;
  sun: SunSky;
  moon: MoonSky;
  spanStartMs: number;
  spanEndMs: number;
  /** Ambient temperature curve across the dark window. */
  ambient: TemperatureCurve;
  /** End of the darkest part of the night: astronomical dawn, else nautical dawn, sunrise, span end. */
  darkEndMs: number;
  moonDaysFromFull: number;
  /** The cached sky of a J2000 position. */
  target(raDeg: number, decDeg: number): TargetSky;
  /** A sun event, a local "HH:MM" (the evening's or the next morning's) or an ISO time; null if it does not happen tonight. */
  whenMs(text: string): number | null;
}

const SUN_EVENT_FIELDS: Record<SunEvent, keyof Night> = {
  sunset: 'sunset',
  'civil-dusk': 'civilDusk',
  'nautical-dusk': 'nauticalDusk',
  'astronomical-dusk': 'astronomicalDusk',
  'astronomical-dawn': 'astronomicalDawn',
  'nautical-dawn': 'nauticalDawn',
  'civil-dawn': 'civilDawn',
  sunrise: 'sunrise',
};

const ms = (iso: string | null | undefined): number | null => (iso ? Date.parse(iso) : null);
const firstOf = (...values: (number | null)[]): number | null => values.find((v) => v !== null) ?? null;

/**
 * The night's sky at a site: sun and moon events from `computeNight`, a sidereal anchor at the
 * middle of the span, the Sun and Moon as interpolated tracks, and per-target caches.
 * `night` may be passed in when the caller already has it.
 */
export function buildNightSky(site: DryRunSite, dateYmd: string, night: Night = computeNight(site, dateYmd)): NightSky {
  const spanStartMs = Date.parse(night.spanStart);
  const spanEndMs = Date.parse(night.spanEnd);
  const env = new SkyEnv(site.latitudeDeg, site.longitudeDeg, (spanStartMs + spanEndMs) / 2, spanEndMs, { points: site.horizon });
  const observer = observerAt(site);
  const targets = new Map<string, TargetSky>();
  const duskMs = firstOf(ms(night.darkStart), ms(night.nauticalDusk), ms(night.civilDusk), ms(night.sunset)) ?? spanStartMs;
  const dawnMs = firstOf(ms(night.darkEnd), ms(night.nauticalDawn), ms(night.civilDawn), ms(night.sunrise)) ?? spanEndMs;
  return {
    night,
    env,
    sun: new SunSky(env, observer, spanStartMs, spanEndMs),
    moon: new MoonSky(env, observer, spanStartMs, spanEndMs),
    spanStartMs,
    spanEndMs,
    ambient: { duskMs, dawnMs, duskTempC: site.duskTempC, dawnTempC: site.dawnTempC },
    darkEndMs: dawnMs,
    moonDaysFromFull: daysFromFullMoon(night.moonPhaseDeg),
    target(raDeg, decDeg) {
      const key = `${raDeg}|${decDeg}`;
      let sky = targets.get(key);
      if (!sky) targets.set(key, (sky = new TargetSky(raDeg, decDeg, env)));
      return sky;
    },
    whenMs: (text) => whenMs(text, night, dateYmd),
  };
}

function whenMs(text: string, night: Night, dateYmd: string): number | null {
  if (isSunEvent(text)) return ms(night[SUN_EVENT_FIELDS[text]] as string | null);
  const hhmm = /^(\d{2}):(\d{2})$/.exec(text);
  if (!hhmm) {
    const t = Date.parse(text);
    return Number.isNaN(t) ? null : t;
  }
  const hh = Number(hhmm[1]);
  const mm = Number(hhmm[2]);
  // The night runs from local noon to local noon: morning times belong to the next date.
  return zonedWallTimeToUtc(hh >= 12 ? dateYmd : addDaysYmd(dateYmd, 1), hh, mm, night.timeZone).getTime();
}
