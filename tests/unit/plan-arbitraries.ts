import fc from 'fast-check';
import { SUN_EVENTS } from '@/shared/recipe/fields';
import { SAMPLE_IDS } from './plan-sample';

/*
 * fast-check arbitraries of valid recipe nodes: every kind with parameters inside the schema's
 * limits (recipe.md), containers nested to depth 3, free text with any Unicode and controls
 * (lengths in code points are kept at half the limits, which count UTF-16 units).
 */

const id = fc.uuid({ version: 4 });
const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const below = (min: number, max: number) => num(min, max).filter((v) => v < max);
const int = (min: number, max: number) => fc.integer({ min, max });
const text = (maxLength: number) => fc.string({ unit: 'binary', maxLength });
const nonBlank = (maxLength: number) => text(maxLength).filter((s) => s.trim().length > 0);
const filter = fc.constantFrom('L', 'R', 'G', 'B', 'Ha', 'OIII', 'SII', 'Y');
const clock = fc.tuple(int(0, 23), int(0, 59)).map(([h, m]) => `${String(h).padStart(2, '0')}:${String(m).padStart(2, '0')}`);
const sunEvent = fc.constantFrom(...SUN_EVENTS);
const optional = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

/** id, label and enabled, as every node has them. */
const base = { id, label: optional(text(40)), enabled: fc.boolean() };
const node = <T extends Record<string, fc.Arbitrary<unknown>>>(kind: string, fields: T) => fc.record({ kind: fc.constant(kind), ...base, ...fields });

export const stepArb = fc.oneof(
  fc.record({ kind: fc.constant('cool'), ...base, setpointC: num(-60, 30), maxRateCPerMin: optional(num(0.1, 30)) }),
  fc.record({ kind: fc.constant('warm'), ...base, targetC: optional(num(-30, 40)), maxRateCPerMin: optional(num(0.1, 30)) }),
  node('slew', { to: fc.oneof(fc.constant({ kind: 'stage-target' }), fc.record({ kind: fc.constant('radec'), raDeg: below(0, 360), decDeg: num(-90, 90) }), fc.record({ kind: fc.constant('altaz'), altDeg: num(-90, 90), azDeg: below(0, 360) })) }),
  fc.record({ kind: fc.constant('centre'), ...base, toleranceArcsec: num(1, 3600), maxAttempts: int(1, 20), solveExposureS: num(0.1, 120), filter: optional(filter) }),
  node('rotate', { to: fc.oneof(fc.record({ positionAngleDeg: below(0, 360) }), fc.constant({ matchFraming: true })), toleranceArcmin: num(0.1, 60) }),
  fc.record({ kind: fc.constant('focus'), ...base, filter: optional(filter), points: int(3, 50), stepSize: int(1, 100000), exposureS: num(0.1, 120) }),
  fc.record({ kind: fc.constant('expose'), ...base, filter, exposureS: num(0.001, 3600), count: int(1, 10000), gain: optional(num(0, 100000)), offset: optional(num(0, 100000)), binning: int(1, 4), ditherEvery: int(0, 1000) }),
  node('guide', { settlePx: num(0.1, 10), settleTimeS: num(0, 300), calibrate: fc.boolean() }),
  node('meridian', {
    policy: fc.oneof(
      fc.record({ kind: fc.constant('flip'), flipAfterMin: num(0, 240), refocus: fc.boolean(), recentre: fc.boolean() }),
      fc.record({ kind: fc.constant('pause-before'), minutesBefore: num(0, 240) }),
      fc.constant({ kind: 'end-stage' }),
    ),
  }),
  node('wait', { until: fc.oneof(clock.map((c) => ({ clock: c })), sunEvent.map((s) => ({ sunEvent: s })), num(-10, 89).map((a) => ({ altitudeAboveDeg: a })), num(1, 86400).map((d) => ({ durationS: d }))) }),
  fc.record({
    kind: fc.constant('flats'),
    ...base,
    source: fc.constantFrom('panel', 'sky'),
    filters: fc.array(filter, { minLength: 1, maxLength: 5 }),
    count: int(1, 500),
    targetAduPct: optional(num(5, 95)),
    matchFramingOf: optional(fc.oneof(id.map((stageId) => ({ kind: 'stage', stageId })), id.map((framingId) => ({ kind: 'framing', framingId })))),
  }),
  fc.record({ kind: fc.constant('darks'), ...base, exposuresS: fc.array(num(0.001, 3600), { minLength: 1, maxLength: 5 }), count: int(1, 500), temperatureC: num(-60, 30), gain: optional(num(0, 100000)), offset: optional(num(0, 100000)), binning: int(1, 4) }),
  node('park', {}),
  node('note', { text: nonBlank(200) }),
);

const ruleArb = fc.oneof(
  fc.record({ kind: fc.constant('refocus-on-temperature'), id, deltaC: num(0.1, 10) }),
  fc.record({ kind: fc.constant('refocus-on-interval'), id, every: fc.oneof(num(1, 1440).map((minutes) => ({ minutes })), int(1, 10000).map((frames) => ({ frames }))) }),
  fc.record({ kind: fc.constant('recentre-on-drift'), id, driftArcmin: num(0.1, 60) }),
);

const timeOrEvent = fc.oneof(clock, sunEvent);
const windowArb = fc.record(
  { notBefore: timeOrEvent, endBy: timeOrEvent, minAltitudeDeg: num(0, 89), maxMoonIlluminationPct: num(0, 100), minMoonSeparationDeg: num(0, 180) },
  { requiredKeys: [] },
);

function containerArb(children: fc.Arbitrary<unknown[]>) {
  const shared = { ...base, rules: fc.array(ruleArb, { maxLength: 2 }), children };
  return fc.oneof(
    fc.record({ kind: fc.constant('stage'), ...shared, targetId: fc.constantFrom(null, SAMPLE_IDS.target), framing: optional(fc.record({ raDeg: below(0, 360), decDeg: num(-90, 90), positionAngleDeg: below(0, 360) })), window: windowArb }),
    fc.record({ kind: fc.constant('repeat'), ...shared, until: fc.oneof(int(1, 10000).map((count) => ({ count })), clock.map((c) => ({ clock: c })), num(-10, 89).map((a) => ({ altitudeBelowDeg: a })), sunEvent.map((s) => ({ sunEvent: s }))) }),
    fc.record({ kind: fc.constant('group'), ...shared }),
  );
}

/** A list of nodes at `level` (1 = top); containers only while level < 3. */
function listArb(level: number): fc.Arbitrary<unknown[]> {
  const item = level >= 3 ? stepArb : fc.oneof({ weight: 3, arbitrary: stepArb }, { weight: 1, arbitrary: containerArb(listArb(level + 1)) });
  return fc.array(item, { maxLength: level === 1 ? 6 : 3 });
}

/** A valid recipe tree's top-level list, containers nested up to three levels. */
export const recipeChildrenArb = listArb(1);
/** Free text for names and notes. */
export const recipeTextArb = { name: nonBlank(40), notes: text(300) };
