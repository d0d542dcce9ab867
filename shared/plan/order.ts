/*
 * The plan's key order, defined here and nowhere else: the sections in PLAN_SECTIONS order;
 * inside any mapping `kind` and `id` first and `rules` and `children` last, every other key in
 * the order its shared schema declares it (a zod parse writes keys in that order, whatever the
 * input's order). Export applies this to a parsed plan, so the same plan always reads the same.
 */
import { PLAN_SECTIONS } from '@/shared/plan/schema';

const LEADING = ['kind', 'id'];
const TRAILING = ['rules', 'children'];

function rank(key: string, index: number, path: readonly string[]): number {
  if (path.length === 0) {
    const section = (PLAN_SECTIONS as readonly string[]).indexOf(key);
    return section >= 0 ? section : PLAN_SECTIONS.length + index;
  }
  const lead = LEADING.indexOf(key);
  if (lead >= 0) return lead - LEADING.length;
  const trail = TRAILING.indexOf(key);
  if (trail >= 0) return 1_000_000 + trail;
  return index;
}

/** A deep copy of plain data with every mapping's keys in the plan's order. */
export function orderKeys(value: unknown, path: readonly string[] = []): unknown {
  if (Array.isArray(value)) return value.map((item) => orderKeys(item, [...path, '[]']));
  if (value === null || typeof value !== 'object') return value;
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  const ranked = entries.map(([key, v], index) => ({ key, v, r: rank(key, index, path) }));
  ranked.sort((a, b) => a.r - b.r);
  const out: Record<string, unknown> = {};
  for (const { key, v } of ranked) out[key] = orderKeys(v, [...path, key]);
  return out;
}
