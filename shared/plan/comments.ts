/*
 * Unit comments of the exported YAML ("exposureS: 300 # seconds"). The unit is already in every
 * key's name; the comment spells it out for a reader who does not know the convention.
 */

const BY_KEY: Record<string, string> = {
  latitudeDeg: 'degrees, north positive',
  longitudeDeg: 'degrees, east positive',
  elevationM: 'metres above sea level',
  raDeg: 'degrees, J2000',
  decDeg: 'degrees, J2000',
  positionAngleDeg: 'degrees east of north',
  azDeg: 'degrees from north through east',
  altDeg: 'degrees above the horizon',
  altitudeAboveDeg: 'degrees, the stage target',
  altitudeBelowDeg: 'degrees, the stage target',
  minutesBefore: 'minutes',
  stepSize: 'focuser steps',
  ditherEvery: 'frames; 0 = never',
  efficiency: 'shutter-open time / elapsed time',
  darknessStart: 'astronomical darkness (Sun below -18°)',
};

const BY_SUFFIX: [RegExp, string][] = [
  [/CPerMin$/, '°C per minute'],
  [/DegPerS$/, 'degrees per second'],
  [/StepsPerC$/, 'focuser steps per °C'],
  [/Arcsec$/, 'arcseconds'],
  [/Arcmin$/, 'arcminutes'],
  [/Deg$/, 'degrees'],
  [/Pct$/, 'percent'],
  [/Mm$/, 'millimetres'],
  [/Um$/, 'micrometres'],
  [/Px$/, 'pixels'],
  [/Steps$/, 'focuser steps'],
  [/Min$/, 'minutes'],
  [/[a-z]C$/, '°C'],
  [/[a-z]S$/, 'seconds'],
];

/** The unit comment for a key, or undefined when its name says nothing about a unit. */
export function unitComment(key: string): string | undefined {
  if (key in BY_KEY) return BY_KEY[key];
  return BY_SUFFIX.find(([re]) => re.test(key))?.[1];
}

/** The comment block at the top of every plan. */
export const PLAN_HEADER = [
  ' Nightloom plan: one imaging night for an automated rig.',
  ' Format nightloom.plan/1, described by schemas/nightloom.plan.v1.schema.json.',
  ' Units are in the key names (S seconds, Deg degrees, C °C, Arcsec, Arcmin, Mm, Pct).',
  ' Times are ISO 8601 with the site’s offset or named sun events; positions are J2000.',
].join('\n');

/** Comments above some sections. */
export const SECTION_COMMENTS: Record<string, string> = {
  targets: ' The targets the stages point at; a stage uses its target’s first framing unless it has its own.',
  recipe: ' The night’s steps in order. Containers (stage, repeat, group) hold children and rules.',
  estimate: ' The dry run when the plan was written: for reading and comparing; never an input.',
};

/**
 * Strings that a YAML 1.1 reader would turn into something else (yes/no/on/off, sexagesimal
 * "21:30", timestamps, numbers) are written in double quotes, so older readers keep them as text.
 */
export function needsQuotes(text: string): boolean {
  return /^(?:y|yes|n|no|on|off|true|false|null|~)$/i.test(text) || /^[-+.0-9][-+.:0-9_eExXoObBTZtz ]*$/.test(text);
}
