import { TARGET_KINDS, type TargetKind } from '@/shared/targets/schema';

/*
 * Object-type codes in catalogue files → our kinds. OpenNGC's codes are listed in its
 * documentation (github.com/mattiaverga/OpenNGC, README "Object types"); generic files may use
 * our own kind ids or a few common words and abbreviations.
 */

/** OpenNGC type code → our kind. "Dup" and "NonEx" are not objects and are skipped by the importer. */
export const OPENNGC_KINDS: Readonly<Record<string, TargetKind>> = {
  '*': 'other',
  '**': 'double-star',
  '*Ass': 'asterism',
  OCl: 'open-cluster',
  GCl: 'globular-cluster',
  'Cl+N': 'cluster-with-nebula',
  G: 'galaxy',
  GPair: 'galaxy-group',
  GTrpl: 'galaxy-group',
  GGroup: 'galaxy-group',
  PN: 'planetary-nebula',
  HII: 'emission-nebula',
  EmN: 'emission-nebula',
  RfN: 'reflection-nebula',
  SNR: 'supernova-remnant',
  DrkN: 'dark-nebula',
  // A nebula of unstated kind (emission or reflection): we have no kind that would not guess.
  Neb: 'other',
  Nova: 'other',
  Other: 'other',
};

/** OpenNGC rows that are no object of their own. */
export const OPENNGC_SKIPPED_TYPES = { duplicate: 'Dup', nonexistent: 'NonEx' } as const;

const WORDS: Readonly<Record<string, TargetKind>> = {
  gx: 'galaxy',
  gal: 'galaxy',
  pn: 'planetary-nebula',
  planetary: 'planetary-nebula',
  'planetary nebula': 'planetary-nebula',
  oc: 'open-cluster',
  'open cluster': 'open-cluster',
  gc: 'globular-cluster',
  globular: 'globular-cluster',
  'globular cluster': 'globular-cluster',
  en: 'emission-nebula',
  emission: 'emission-nebula',
  'emission nebula': 'emission-nebula',
  rn: 'reflection-nebula',
  reflection: 'reflection-nebula',
  'reflection nebula': 'reflection-nebula',
  dn: 'dark-nebula',
  dark: 'dark-nebula',
  'dark nebula': 'dark-nebula',
  snr: 'supernova-remnant',
  'supernova remnant': 'supernova-remnant',
  ds: 'double-star',
  'double star': 'double-star',
};

const KIND_IDS = new Set<string>(TARGET_KINDS);
const OPENNGC_LOWER = new Map(Object.entries(OPENNGC_KINDS).map(([code, kind]) => [code.toLowerCase(), kind]));

/** A type text from a generic file → our kind: our ids, OpenNGC codes, common words; else 'other'. */
export function kindFromText(text: string): TargetKind {
  const t = text.trim().toLowerCase().replace(/[_\s]+/g, ' ');
  if (KIND_IDS.has(t.replace(/ /g, '-'))) return t.replace(/ /g, '-') as TargetKind;
  return OPENNGC_LOWER.get(t) ?? WORDS[t] ?? 'other';
}
