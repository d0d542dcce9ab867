import { recordedFramings, isSolved } from '@/shared/calibration/framings';
import { integrationByFilter, nightsOf, totalSeconds } from '@/shared/calibration/integration';
import { separationDeg } from '@/shared/calibration/sky-geometry';
import type { HistoryTargetRef, StoredFrame } from '@/shared/calibration/types';
import type { HistoryTarget, TargetHistory } from '@/shared/schemas/calibration-api';

/*
 * Capture history: which target each light belongs to, totals per target, and one target's
 * recorded framings and nights.
 */

/** A light links to the nearest target whose centre lies within this of the frame's centre (Nightloom choice: larger than a pointing error, smaller than most targets' spacing). */
export const LINK_RADIUS_DEG = 1;

/** Label of the row for unmatched lights that recorded no OBJECT. */
export const UNNAMED_LABEL = 'Unnamed';

/** An object name for comparison: case, spaces and hyphens ignored ("M 31" = "m31", "Sh2-155" = "sh2 155"). */
export function normaliseObjectName(text: string): string {
  return text.toLowerCase().replace(/[\s-]+/g, '');
}

/** Where a frame points: its plate-solved centre, else the telescope's pointing; null with neither. */
function framePosition(f: StoredFrame): { raDeg: number; decDeg: number } | null {
  if (f.wcsRaDeg !== null && f.wcsDecDeg !== null) return { raDeg: f.wcsRaDeg, decDeg: f.wcsDecDeg };
  if (f.pointingRaDeg !== null && f.pointingDecDeg !== null) return { raDeg: f.pointingRaDeg, decDeg: f.pointingDecDeg };
  return null;
}

/**
 * Which target a light belongs to: the nearest target whose centre is within 1° of the frame's
 * WCS centre (else its pointing); else the target whose designation, name or an alias equals
 * OBJECT with case, spaces and hyphens ignored; null when none.
 */
export function linkLight(frame: StoredFrame, targets: readonly HistoryTargetRef[]): string | null {
  const at = framePosition(frame);
  if (at) {
    let best: { id: string; sep: number } | null = null;
    for (const t of targets) {
      const sep = separationDeg(at.raDeg, at.decDeg, t.raDeg, t.decDeg);
      if (sep <= LINK_RADIUS_DEG && (!best || sep < best.sep)) best = { id: t.id, sep };
    }
    if (best) return best.id;
  }
  const name = normaliseObjectName(frame.object ?? '');
  if (name === '') return null;
  return targets.find((t) => [t.designation, t.name, ...t.aliases].some((n) => normaliseObjectName(n) === name))?.id ?? null;
}

/** The group an unmatched light falls in: its normalised OBJECT, or that of "Unnamed". */
function objectGroup(f: StoredFrame): string {
  const name = normaliseObjectName(f.object ?? '');
  return name === '' ? normaliseObjectName(UNNAMED_LABEL) : name;
}

/** ISO 8601 UTC instants sort as plain strings (faster than a locale compare on thousands of frames). */
const byTime = (a: StoredFrame, b: StoredFrame) => (a.takenAt < b.takenAt ? -1 : a.takenAt > b.takenAt ? 1 : 0);

/** A history row from a group's lights; first and last night are '' when it has none. */
function historyRow(targetId: string | null, label: string, name: string, lights: readonly StoredFrame[], sharedWith: string[]): HistoryTarget {
  const nights = nightsOf(lights);
  return {
    targetId,
    label,
    name,
    frames: lights.length,
    seconds: totalSeconds(lights),
    nights: nights.length,
    firstNight: nights[0] ?? '',
    lastNight: nights[nights.length - 1] ?? '',
    byFilter: integrationByFilter(lights),
    sharedWith,
  };
}

/**
 * GET /api/history rows: every target with lights (label = designation), and the unmatched
 * lights grouped by OBJECT (case, spaces and hyphens ignored; label = the text as first taken,
 * "Unnamed" without one). `shares` maps target id → club ids. Latest night first.
 */
export function historySummary(lights: readonly StoredFrame[], targets: readonly HistoryTargetRef[], shares: ReadonlyMap<string, string[]>): HistoryTarget[] {
  const byId = new Map(targets.map((t) => [t.id, t]));
  const groups = new Map<string, { targetId: string | null; label: string; name: string; lights: StoredFrame[] }>();
  for (const f of [...lights].filter((l) => l.frameType === 'light').sort(byTime)) {
    const targetId = linkLight(f, targets);
    const target = targetId === null ? undefined : byId.get(targetId);
    const key = target ? `target:${target.id}` : `object:${objectGroup(f)}`;
    const group = groups.get(key) ?? { targetId: target?.id ?? null, label: target ? target.designation : (f.object?.trim() || UNNAMED_LABEL), name: target?.name ?? '', lights: [] };
    group.lights.push(f);
    groups.set(key, group);
  }
  return [...groups.values()]
    .map((g) => historyRow(g.targetId, g.label, g.name, g.lights, g.targetId === null ? [] : [...(shares.get(g.targetId) ?? [])]))
    .sort((a, b) => b.lastNight.localeCompare(a.lastNight) || a.label.localeCompare(b.label));
}

/** Nights oldest first, each with its integration per filter. */
function historyNights(lights: readonly StoredFrame[]): TargetHistory['nights'] {
  const byNight = new Map<string, StoredFrame[]>();
  for (const f of lights) {
    const those = byNight.get(f.nightDate);
    if (those) those.push(f);
    else byNight.set(f.nightDate, [f]);
  }
  return nightsOf(lights).map((nightDate) => {
    const those = byNight.get(nightDate) ?? [];
    return { nightDate, byFilter: integrationByFilter(those), seconds: totalSeconds(those) };
  });
}

function historyOf(row: HistoryTarget, lights: readonly StoredFrame[], framingsOfUser: HistoryTargetRef['framings']): TargetHistory {
  return { target: row, framings: recordedFramings(lights, framingsOfUser), nights: historyNights(lights), unsolvedFrames: lights.filter((f) => !isSolved(f)).length };
}

/**
 * GET /api/history/targets/:id: one target's totals, recorded framings (see
 * `recordedFramings`), nights oldest first and the count of lights without a plate solution.
 * A light is the target's when `linkLight` links it there among `allTargets` (default: this
 * target alone; pass every target so a frame nearer another one stays with that one).
 */
export function targetHistory(target: HistoryTargetRef, lights: readonly StoredFrame[], sharedWith: string[], allTargets: readonly HistoryTargetRef[] = [target]): TargetHistory {
  const mine = lights.filter((f) => f.frameType === 'light' && linkLight(f, allTargets) === target.id);
  return historyOf(historyRow(target.id, target.designation, target.name, mine, sharedWith), mine, target.framings);
}

/**
 * GET /api/history/objects/:label: the unmatched lights (no target among `targets`) whose OBJECT
 * equals `label` with case, spaces and hyphens ignored ("Unnamed" also takes lights without one).
 */
export function objectHistory(label: string, lights: readonly StoredFrame[], targets: readonly HistoryTargetRef[]): TargetHistory {
  const wanted = normaliseObjectName(label) || normaliseObjectName(UNNAMED_LABEL);
  const mine = lights.filter((f) => f.frameType === 'light' && linkLight(f, targets) === null && objectGroup(f) === wanted).sort(byTime);
  const shown = mine[0]?.object?.trim() || (mine.length > 0 ? UNNAMED_LABEL : label);
  return historyOf(historyRow(null, shown, '', mine, []), mine, []);
}
