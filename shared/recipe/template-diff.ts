import { formatNumber as n } from '@/shared/recipe/format';
import { summarizeNode } from '@/shared/recipe/summary';
import type { SuggestedTarget } from '@/shared/recipe/template';
import type { NodeKind, RecipeNode, RecipeTree } from '@/shared/recipe/types';

/*
 * What a newer template version changes, step by step, in the imager's words. Each list of
 * children is aligned with the other's (a weighted longest common subsequence): identical
 * steps anchor it, steps of the same kind between anchors pair up as 'changed' (the most alike
 * pairs win) and the rest are 'added' or 'removed'. Ids are ignored (a copy has fresh ones); a
 * flats step's reference to a stage follows the stages paired by that alignment. Every change
 * carries the step's summary (shared/recipe/summary.ts) and where it sits; the client puts the
 * sentence together.
 */

/** Where a changed step sits: its place in its list and the containers around it. */
export interface ChangePlace {
  /** The enclosing stages, repeats and groups, outermost first, e.g. "stage 'M 31'", "Repeat 10 times". */
  within: string[];
  /** 1-based place in its list (the newer tree for added and changed steps, the older one for removed). */
  step: number;
  /** The step just before it in the newer tree (label or short name); absent at the start of the list. */
  after?: string;
}

export interface TreeChange {
  kind: 'added' | 'removed' | 'changed';
  /** Positions from the root, 0-based, joined by dots (in the tree the step is in): a stable key. */
  path: string;
  nodeKind: NodeKind;
  /** The step in words before (older version or one's copy) and after (the newer version). */
  before?: string;
  after?: string;
  /** Changes the summaries do not show: "turned off", "renamed to 'Core'", "rules changed". */
  settings?: string[];
  /** Steps inside an added or removed stage, repeat or group. */
  innerSteps?: number;
  where: ChangePlace;
}

export interface DiffOptions {
  /** Suggested targets by stage id (template versions, re-abstracted copies): they name stages. */
  fromTargets?: Record<string, SuggestedTarget>;
  toTargets?: Record<string, SuggestedTarget>;
}

const SHORT_NAMES: Record<NodeKind, string> = {
  stage: 'Stage', repeat: 'Repeat', group: 'Group', cool: 'Cool', warm: 'Warm', slew: 'Slew', centre: 'Centre', rotate: 'Rotate', focus: 'Focus',
  expose: 'Expose', guide: 'Guide', meridian: 'Meridian', wait: 'Wait', flats: 'Flats', darks: 'Darks', park: 'Park', note: 'Note',
};

const childrenOf = (node: RecipeNode): RecipeNode[] => ('children' in node ? node.children : []);
const countSteps = (nodes: RecipeNode[]): number => nodes.reduce((sum, c) => sum + 1 + countSteps(childrenOf(c)), 0);

/** Stable JSON (sorted keys) so key order never counts as a change. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    return `{${entries.sort(([a], [b]) => (a < b ? -1 : 1)).map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** One tree read for the diff: stage names, and each node's settings and whole content in comparable form. */
class TreeView {
  private stages = new Map<string, { node: RecipeNode; no: number }>();
  private own = new Map<string, Record<string, string>>();
  private whole = new Map<string, string>();

  constructor(tree: RecipeTree, private targets: Record<string, SuggestedTarget> = {}) {
    const visit = (node: RecipeNode) => {
      if (node.kind === 'stage') this.stages.set(node.id, { node, no: this.stages.size + 1 });
      childrenOf(node).forEach(visit);
    };
    tree.children.forEach(visit);
  }

  /** The node's own settings (no id, no children; a stage reference without its id), each as canonical JSON. */
  settings(node: RecipeNode): Record<string, string> {
    let out = this.own.get(node.id);
    if (!out) {
      const copy = { ...node } as Record<string, unknown>;
      delete copy.id;
      delete copy.children;
      if (Array.isArray(copy.rules)) copy.rules = (copy.rules as Record<string, unknown>[]).map(({ id: _id, ...rest }) => rest);
      if (this.stageRef(node)) copy.matchFramingOf = { kind: 'stage' };
      out = Object.fromEntries(Object.entries(copy).filter(([, v]) => v !== undefined).map(([k, v]) => [k, canonical(v)]));
      this.own.set(node.id, out);
    }
    return out;
  }

  /** The stage whose framing a flats step matches. */
  stageRef(node: RecipeNode): string | undefined {
    return node.kind === 'flats' && node.matchFramingOf?.kind === 'stage' ? node.matchFramingOf.stageId : undefined;
  }

  /** The node with everything under it, comparable across trees. */
  content(node: RecipeNode): string {
    let out = this.whole.get(node.id);
    if (out === undefined) {
      out = `${canonical(this.settings(node))}[${childrenOf(node).map((c) => this.content(c)).join(',')}]`;
      this.whole.set(node.id, out);
    }
    return out;
  }

  /** A stage's suggested target as people call it (designation, else name). */
  targetName(node: RecipeNode): string | undefined {
    const t = this.targets[node.id];
    return t ? t.designation || t.name : undefined;
  }

  /** "stage 'Core'" (label, else target, else `fallback`), else "stage 2"; a repeat or group by label or summary. */
  containerName(node: RecipeNode, fallback?: string): string {
    if (node.kind !== 'stage') return node.label ?? summarizeNode(node);
    const name = node.label ?? this.targetName(node) ?? fallback;
    return name ? `stage '${name}'` : `stage ${this.stages.get(node.id)?.no ?? ''}`.trim();
  }

  stageName(stageId: string): string {
    const s = this.stages.get(stageId);
    return s ? this.containerName(s.node) : 'a stage';
  }

  /** The step in words; a stage opens with its target's name (or its label) when one is known. */
  summary(node: RecipeNode, targetName = this.targetName(node) ?? node.label): string {
    return node.kind === 'stage' && targetName ? summarizeNode({ ...node, targetId: node.id }, { targetName: () => targetName }) : summarizeNode(node);
  }

  /** A short name for "after 'Focus'": the label, an exposure's filter and frames, a stage's name. */
  shortName(node: RecipeNode): string {
    if (node.label) return node.label;
    if (node.kind === 'expose') return `${node.filter} ${node.count} × ${n(node.exposureS)} s`;
    if (node.kind === 'stage') return this.containerName(node).replace(/^stage '(.*)'$/, '$1');
    if (node.kind === 'repeat') return summarizeNode(node);
    return SHORT_NAMES[node.kind];
  }
}

/** How alike two nodes are: null when they may not pair (kinds differ), higher for more equal settings. */
function likeness(x: RecipeNode, y: RecipeNode, a: TreeView, b: TreeView): number | null {
  if (x.kind !== y.kind) return null;
  if (a.content(x) === b.content(y)) return 10_000;
  const sx = a.settings(x);
  const sy = b.settings(y);
  const keys = new Set([...Object.keys(sx), ...Object.keys(sy)]);
  return 1 + [...keys].filter((k) => sx[k] === sy[k]).length;
}

/** Above this many cells the alignment falls back to pairing by position (a recipe may hold 2000 nodes in one list). */
const MAX_ALIGN_CELLS = 250_000;

/** Index pairs [i, j] of the best alignment of two lists (dynamic programming, weights from `likeness`). */
function align(xs: RecipeNode[], ys: RecipeNode[], a: TreeView, b: TreeView): [number, number][] {
  if (xs.length * ys.length > MAX_ALIGN_CELLS) {
    return xs.flatMap((x, i) => (i < ys.length && ys[i]!.kind === x.kind ? [[i, i] as [number, number]] : []));
  }
  const score: number[][] = Array.from({ length: xs.length + 1 }, () => new Array<number>(ys.length + 1).fill(0));
  const like = xs.map((x) => ys.map((y) => likeness(x, y, a, b)));
  for (let i = 1; i <= xs.length; i++) {
    for (let j = 1; j <= ys.length; j++) {
      const l = like[i - 1]![j - 1] ?? null;
      score[i]![j] = Math.max(score[i - 1]![j]!, score[i]![j - 1]!, l === null ? -1 : score[i - 1]![j - 1]! + l);
    }
  }
  const pairs: [number, number][] = [];
  for (let i = xs.length, j = ys.length; i > 0 && j > 0; ) {
    const l = like[i - 1]![j - 1] ?? null;
    if (l !== null && score[i]![j] === score[i - 1]![j - 1]! + l) pairs.unshift([--i, --j]);
    else if (score[i]![j] === score[i - 1]![j]) i--;
    else j--;
  }
  return pairs;
}

/** The changes that turn `from` (an older version, or one's copy re-abstracted) into `to`. */
export function diffTemplateTrees(from: RecipeTree, to: RecipeTree, opts: DiffOptions = {}): TreeChange[] {
  const a = new TreeView(from, opts.fromTargets);
  const b = new TreeView(to, opts.toTargets);
  // First every list is aligned, so a flats step's stage can be followed into the other tree.
  const pairsOf = new Map<RecipeNode[], [number, number][]>();
  const stageTwin = new Map<string, string>();
  const alignLists = (xs: RecipeNode[], ys: RecipeNode[]) => {
    const pairs = align(xs, ys, a, b);
    pairsOf.set(xs, pairs);
    for (const [i, j] of pairs) {
      const x = xs[i]!;
      const y = ys[j]!;
      if (x.kind === 'stage') stageTwin.set(x.id, y.id);
      if ('children' in x && 'children' in y) alignLists(x.children, y.children);
    }
  };
  alignLists(from.children, to.children);

  /** Settings a summary does not show, in words (`sameSummary`: the summaries read alike, so say something). */
  const settingWords = (x: RecipeNode, y: RecipeNode, refMoved: boolean, sameSummary: boolean): string[] => {
    const sx = a.settings(x);
    const sy = b.settings(y);
    const differs = (k: string) => sx[k] !== sy[k];
    const words: string[] = [];
    if (differs('enabled')) words.push(y.enabled === false ? 'turned off' : 'turned on');
    if (differs('label')) words.push(y.label ? `renamed to '${y.label}'` : 'name removed');
    if (differs('rules')) words.push('rules changed');
    if (differs('framing')) words.push('own framing changed');
    const ref = b.stageRef(y);
    if (refMoved && ref) words.push(`now matches ${b.stageName(ref)}`);
    if (sameSummary && differs('text')) words.push('note text changed');
    if (sameSummary && words.length === 0) words.push('other settings changed');
    return words;
  };

  const changes: TreeChange[] = [];
  const key = (prefix: string, i: number) => (prefix ? `${prefix}.${i}` : String(i));
  const compareLists = (xs: RecipeNode[], ys: RecipeNode[], xPath: string, yPath: string, within: string[]) => {
    const added = (j: number) => {
      const y = ys[j]!;
      const inner = countSteps(childrenOf(y));
      const where: ChangePlace = { within, step: j + 1, ...(j > 0 ? { after: b.shortName(ys[j - 1]!) } : {}) };
      changes.push({ kind: 'added', path: key(yPath, j), nodeKind: y.kind, after: b.summary(y), ...(inner ? { innerSteps: inner } : {}), where });
    };
    const removed = (i: number) => {
      const x = xs[i]!;
      const inner = countSteps(childrenOf(x));
      changes.push({ kind: 'removed', path: key(xPath, i), nodeKind: x.kind, before: a.summary(x), ...(inner ? { innerSteps: inner } : {}), where: { within, step: i + 1 } });
    };
    let i = 0;
    let j = 0;
    for (const [pi, pj] of [...(pairsOf.get(xs) ?? []), [xs.length, ys.length] as const]) {
      for (; i < pi; i++) removed(i);
      for (; j < pj; j++) added(j);
      if (pi === xs.length) break;
      const x = xs[pi]!;
      const y = ys[pj]!;
      i = pi + 1;
      j = pj + 1;
      // A stage keeps one name on both sides: its target is never part of a template version.
      const target = a.targetName(x) ?? b.targetName(y) ?? x.label ?? y.label;
      const xRef = a.stageRef(x);
      const refMoved = (xRef === undefined ? undefined : stageTwin.get(xRef)) !== b.stageRef(y);
      if (canonical(a.settings(x)) !== canonical(b.settings(y)) || refMoved) {
        const before = a.summary(x, target);
        const after = b.summary(y, target);
        const settings = settingWords(x, y, refMoved, before === after);
        changes.push({ kind: 'changed', path: key(yPath, pj), nodeKind: y.kind, before, after, ...(settings.length ? { settings } : {}), where: { within, step: pj + 1 } });
      }
      const name = x.kind === 'stage' ? a.containerName(x, y.label ?? b.targetName(y)) : a.containerName(x);
      if ('children' in x && 'children' in y) compareLists(x.children, y.children, key(xPath, pi), key(yPath, pj), [...within, name]);
    }
  };
  compareLists(from.children, to.children, '', '', []);
  return changes;
}
