import { getPath, textOf, type DraftValues, type FieldSpec } from '@/components/recipes/node-editor/draft-types';
import { RECIPE_DEFAULTS as D } from '@/shared/recipe/defaults';
import { isSunEvent } from '@/shared/recipe/fields';
import type { NodeKind, RecipeNode } from '@/shared/recipe/types';

/*
 * The parameters each kind's form edits, by dotted path. `label` and `enabled` (every node)
 * and `rules` (containers) are handled beside these; `id`, `kind` and `children` never change.
 */

/** True while the draft field at `path` is one of `values`. */
const when =
  (path: string, ...values: string[]) =>
  (v: DraftValues) =>
    values.includes(textOf(v, path));

/** The chooser of an exactly-one union: which of `keys` under `path` the node uses. */
function unionMode(path: string, keys: readonly string[]): FieldSpec {
  const first = keys[0] ?? '';
  return { path: `${path}.mode`, type: 'mode', initial: first, derive: (node) => keys.find((k) => getPath(node, `${path}.${k}`) !== undefined) ?? first };
}

/** A union branch: part of the node only while its mode is chosen. */
const branch = (path: string, key: string, type: FieldSpec['type'], initial = ''): FieldSpec => ({ path: `${path}.${key}`, type, initial, include: when(`${path}.mode`, key) });

/** Time-or-sun-event fields of a stage window: chooser "none" | "sun" | "clock", then the value. */
function timeOrSunEvent(path: string, initialEvent: string): FieldSpec[] {
  const derive = (node: RecipeNode) => {
    const v = getPath(node, path);
    return typeof v !== 'string' ? 'none' : isSunEvent(v) ? 'sun' : 'clock';
  };
  return [
    { path: `${path}.mode`, type: 'mode', initial: 'none', derive },
    { path, type: 'text', initial: initialEvent, include: when(`${path}.mode`, 'sun', 'clock') },
  ];
}

const hasFraming = (v: DraftValues) => textOf(v, 'framing.mode') !== 'none';

const STAGE: FieldSpec[] = [
  { path: 'targetId', type: 'nullableId' },
  { path: 'framing.mode', type: 'mode', initial: 'none', derive: (node) => (getPath(node, 'framing') === undefined ? 'none' : 'custom') },
  { path: 'framing.raDeg', type: 'ra', initial: '', include: hasFraming },
  { path: 'framing.decDeg', type: 'dec', initial: '', include: hasFraming },
  { path: 'framing.positionAngleDeg', type: 'number', initial: '0', include: hasFraming },
  ...timeOrSunEvent('window.notBefore', 'astronomical-dusk'),
  ...timeOrSunEvent('window.endBy', 'astronomical-dawn'),
  { path: 'window.minAltitudeDeg', type: 'optionalNumber' },
  { path: 'window.maxMoonIlluminationPct', type: 'optionalNumber' },
  { path: 'window.minMoonSeparationDeg', type: 'optionalNumber' },
];

const REPEAT_KEYS = ['count', 'clock', 'altitudeBelowDeg', 'sunEvent'] as const;
const REPEAT: FieldSpec[] = [
  unionMode('until', REPEAT_KEYS),
  branch('until', 'count', 'number'),
  branch('until', 'clock', 'text'),
  branch('until', 'altitudeBelowDeg', 'number'),
  branch('until', 'sunEvent', 'text', 'astronomical-dawn'),
];

const WAIT_KEYS = ['clock', 'sunEvent', 'altitudeAboveDeg', 'durationS'] as const;
const WAIT: FieldSpec[] = [
  unionMode('until', WAIT_KEYS),
  branch('until', 'clock', 'text'),
  branch('until', 'sunEvent', 'text', 'astronomical-dusk'),
  branch('until', 'altitudeAboveDeg', 'number'),
  branch('until', 'durationS', 'number'),
];

const SLEW: FieldSpec[] = [
  { path: 'to.kind', type: 'choice', initial: 'stage-target' },
  { path: 'to.raDeg', type: 'ra', initial: '', include: when('to.kind', 'radec') },
  { path: 'to.decDeg', type: 'dec', initial: '', include: when('to.kind', 'radec') },
  { path: 'to.altDeg', type: 'number', initial: '', include: when('to.kind', 'altaz') },
  { path: 'to.azDeg', type: 'number', initial: '', include: when('to.kind', 'altaz') },
];

const ROTATE: FieldSpec[] = [
  unionMode('to', ['matchFraming', 'positionAngleDeg']),
  branch('to', 'positionAngleDeg', 'number'),
  branch('to', 'matchFraming', 'true'),
  { path: 'toleranceArcmin', type: 'number' },
];

const flip = when('policy.kind', 'flip');
const MERIDIAN: FieldSpec[] = [
  { path: 'policy.kind', type: 'choice', initial: 'flip' },
  { path: 'policy.flipAfterMin', type: 'number', initial: String(D.meridian.flipAfterMin), include: flip },
  { path: 'policy.refocus', type: 'flag', initial: D.meridian.refocus, include: flip },
  { path: 'policy.recentre', type: 'flag', initial: D.meridian.recentre, include: flip },
  { path: 'policy.minutesBefore', type: 'number', initial: String(D.meridian.pauseMinutesBefore), include: when('policy.kind', 'pause-before') },
];

/**
 * What a flats step matches: `framing` keeps a stage's or a recorded framing as it is (it can only
 * be dropped here); `positions` edits the rotator angle and focuser position the lights used.
 */
const matchMode = (node: RecipeNode) => {
  const kind = getPath(node, 'matchFramingOf.kind');
  return kind === undefined ? 'none' : kind === 'positions' ? 'positions' : 'framing';
};
const atPositions = when('matchFramingOf.mode', 'positions');
const FLATS_MATCH: FieldSpec[] = [
  { path: 'matchFramingOf.mode', type: 'mode', initial: 'none', derive: matchMode },
  { path: 'matchFramingOf', type: 'keep', include: when('matchFramingOf.mode', 'framing') },
  { path: 'matchFramingOf.kind', type: 'choice', initial: 'positions', include: atPositions },
  { path: 'matchFramingOf.rotatorAngleDeg', type: 'optionalNumber', include: atPositions },
  { path: 'matchFramingOf.focuserPositionSteps', type: 'optionalNumber', include: atPositions },
];

const num = (path: string): FieldSpec => ({ path, type: 'number' });
const opt = (path: string): FieldSpec => ({ path, type: 'optionalNumber' });

/** The fields of each kind's form. */
export const KIND_FIELDS: Record<NodeKind, readonly FieldSpec[]> = {
  stage: STAGE,
  repeat: REPEAT,
  group: [],
  cool: [num('setpointC'), opt('maxRateCPerMin')],
  warm: [opt('targetC'), opt('maxRateCPerMin')],
  slew: SLEW,
  centre: [num('toleranceArcsec'), num('maxAttempts'), num('solveExposureS'), { path: 'filter', type: 'optionalText' }],
  rotate: ROTATE,
  focus: [{ path: 'filter', type: 'optionalText' }, num('points'), num('stepSize'), num('exposureS')],
  expose: [
    { path: 'filter', type: 'text' },
    num('exposureS'),
    num('count'),
    opt('gain'),
    opt('offset'),
    num('binning'),
    num('ditherEvery'),
    { path: 'frameType', type: 'choice', initial: 'light' },
  ],
  guide: [num('settlePx'), num('settleTimeS'), { path: 'calibrate', type: 'flag' }],
  meridian: MERIDIAN,
  wait: WAIT,
  flats: [
    { path: 'source', type: 'choice', initial: D.flats.source },
    { path: 'filters', type: 'textList' },
    num('count'),
    opt('targetAduPct'),
    ...FLATS_MATCH,
  ],
  darks: [{ path: 'exposuresS', type: 'numberList' }, num('count'), num('temperatureC'), opt('gain'), opt('offset'), num('binning')],
  park: [],
  note: [{ path: 'text', type: 'text' }],
};
