import type { NodeOf, RecipeNode, RecipeRule, StageNode } from '@/shared/recipe/types';
import type { FocusParams } from '@/shared/dry-run/models/focus';
import type { TargetSky } from '@/shared/dry-run/sky/target-sky';

/** Why a container ends early. */
export type EndReason = 'window' | 'altitude' | 'until' | 'meridian' | 'night' | 'cap';

/** A time after which nothing more may run inside its owner (a stage, a repeat, the night). */
export interface Deadline {
  ownerId: string;
  reason: EndReason;
  /** The deadline as seen from `ms` (an altitude deadline is the next sinking after it). */
  at(ms: number): number;
}

export type MeridianPolicy = NodeOf<'meridian'>['policy'];

/** What a stage sets up for the steps inside it. */
export interface StageCtx {
  node: StageNode;
  targetId: string | null;
  name: string;
  raDeg: number;
  decDeg: number;
  framingPaDeg: number;
  sky: TargetSky;
  /** Minimum altitude (with the horizon profile on top). */
  limitDeg: number;
  policy: MeridianPolicy | null;
  policyNodeId: string | null;
  /** A rotate step with matchFraming ran: after a flip the rotator restores the framing. */
  restoreRotation: boolean;
  focus: FocusParams;
  /** The stage's centring settings (the last centre step's, else the defaults), reused after a flip. */
  centre: { toleranceArcsec: number; maxAttempts: number; solveExposureS: number };
  /** Findings already reported once for this stage. */
  reported: Set<string>;
}

export interface ScopedRule {
  rule: RecipeRule;
  ownerId: string;
}

/** The context a node runs in. */
export interface Scope {
  stage: StageCtx | null;
  rules: ScopedRule[];
  deadlines: Deadline[];
  /** Inside a repeat with no count: running into a deadline is the plan, not a shortfall. */
  openEnded: boolean;
  /** A sky-flats step in this container allows slews in bright twilight. */
  skyFlats: boolean;
}

/** A container ended by a deadline, unwinding to its owner. */
export interface Ended {
  ownerId: string;
  reason: EndReason;
  openEnded: boolean;
  atMs: number;
}

/** The earliest deadline as seen from `ms` (ties: the outermost owner). */
export function earliestDeadline(scope: Scope, ms: number): { at: number; deadline: Deadline } | null {
  let best: { at: number; deadline: Deadline } | null = null;
  for (const deadline of scope.deadlines) {
    const at = deadline.at(ms);
    if (best === null || at < best.at) best = { at, deadline };
  }
  return best;
}

/** Null when an action of `durationS` starting at `startMs` ends by every deadline; else who ends it. */
export function fits(scope: Scope, startMs: number, durationS: number): Ended | null {
  const earliest = earliestDeadline(scope, startMs);
  if (!earliest || startMs + durationS * 1000 <= earliest.at) return null;
  return { ownerId: earliest.deadline.ownerId, reason: earliest.deadline.reason, openEnded: scope.openEnded, atMs: startMs };
}

/** A child scope with more deadlines and rules. */
export function childScope(scope: Scope, more: { deadlines?: Deadline[]; rules?: ScopedRule[]; stage?: StageCtx | null; openEnded?: boolean; skyFlats?: boolean }): Scope {
  return {
    stage: more.stage === undefined ? scope.stage : more.stage,
    rules: more.rules ? [...scope.rules, ...more.rules] : scope.rules,
    deadlines: more.deadlines ? [...scope.deadlines, ...more.deadlines] : scope.deadlines,
    openEnded: more.openEnded ?? scope.openEnded,
    skyFlats: more.skyFlats ?? scope.skyFlats,
  };
}

/** A container's rules, each with its owner. */
export function scopedRules(node: { id: string; rules: RecipeRule[] }): ScopedRule[] {
  return node.rules.map((rule) => ({ rule, ownerId: node.id }));
}

/** True when a list holds a sky-flats step (bright-twilight slews are then expected). */
export function hasSkyFlats(children: RecipeNode[]): boolean {
  return children.some((c) => c.enabled && ((c.kind === 'flats' && c.source === 'sky') || ('children' in c && hasSkyFlats(c.children))));
}
