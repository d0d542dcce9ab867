/**
 * "Add as a target" for lights no target matched: which catalogue object their OBJECT names, or
 * a target at their recorded centre. Pure, so the unit tests read it directly.
 */
import { normaliseObjectName, UNNAMED_LABEL } from '@/shared/calibration/history';
import type { TargetHistory } from '@/shared/schemas/calibration-api';
import type { CatalogueSearchResult, TargetInput } from '@/shared/schemas/target';
import { foldForSearch, hasDesignation } from '@/shared/targets/search';
import { formatDec, formatRa } from '@/shared/targets/schema';

/** Longest designation a target takes (`catalogueObjectSchema`). */
const MAX_DESIGNATION = 60;
/** Most aliases a target takes. */
const MAX_ALIASES = 40;

/** Whether the lights grouped under `label` recorded no OBJECT (the "Unnamed" row). */
export function isUnnamedObject(label: string): boolean {
  return normaliseObjectName(label) === normaliseObjectName(UNNAMED_LABEL);
}

/**
 * The one catalogue object the OBJECT text names: the only hit named by it exactly (designation,
 * alias or common name), else the search's only hit; null when none or several could be meant.
 */
export function catalogueMatch(label: string, results: readonly CatalogueSearchResult[]): CatalogueSearchResult | null {
  const folded = foldForSearch(label);
  const exact = results.filter((r) => hasDesignation(r, label) || (folded !== '' && foldForSearch(r.name) === folded));
  if (exact.length === 1) return exact[0]!;
  return exact.length === 0 && results.length === 1 ? results[0]! : null;
}

/** Whether a target named so would take lights with this OBJECT by name (as `linkLight` compares). */
function namesObject(names: readonly string[], label: string): boolean {
  const wanted = normaliseObjectName(label);
  return names.some((n) => normaliseObjectName(n) === wanted);
}

/**
 * A catalogue hit as the new target: its fields, plus the OBJECT text as an alias when the
 * object does not already go by it, so the lights link by name even without a plate solution.
 */
export function targetFromMatch(match: CatalogueSearchResult, label: string): TargetInput {
  const { designation, aliases, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude } = match;
  const text = label.trim().slice(0, MAX_DESIGNATION);
  const withObject = namesObject([designation, name, ...aliases], label) || aliases.length >= MAX_ALIASES ? aliases : [...aliases, text];
  return { designation, aliases: withObject, name, type, raDeg, decDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude, notes: '' };
}

/**
 * A target at the centre of the lights' first recorded framing, named by their OBJECT; null
 * when no light has a plate solution (no centre is known) or the lights recorded no OBJECT.
 */
export function targetAtCentre(label: string, history: TargetHistory): TargetInput | null {
  const framing = history.framings[0];
  const designation = label.trim().slice(0, MAX_DESIGNATION);
  if (!framing || designation === '' || isUnnamedObject(designation)) return null;
  return {
    designation,
    aliases: [],
    name: '',
    type: 'other',
    raDeg: ((framing.raDeg % 360) + 360) % 360,
    decDeg: framing.decDeg,
    majorArcmin: 0,
    minorArcmin: null,
    positionAngleDeg: null,
    magnitude: null,
    notes: '',
  };
}

/** "M42 · Orion Nebula", or the designation alone. */
export function targetTitle(t: { designation: string; name: string }): string {
  return t.name && t.name !== t.designation ? `${t.designation} · ${t.name}` : t.designation;
}

/** "05:35:17.3  -05:23:28" (J2000), as the recorded framings show a centre. */
export function centreText(t: { raDeg: number; decDeg: number }): string {
  return `${formatRa(t.raDeg)}  ${formatDec(t.decDeg)}`;
}
