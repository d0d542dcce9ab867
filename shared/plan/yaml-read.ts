import { Composer, Document, isAlias, isMap, isPair, isSeq, LineCounter, Parser, YAMLParseError, type Node } from 'yaml';
import { PLAN_LIMITS } from '@/shared/plan/format';
import { prescanYaml } from '@/shared/plan/prescan';

/** Where a problem is: 1-based line and column (null when it concerns the whole file). */
export interface PlanIssue {
  line: number | null;
  column: number | null;
  /** Printable path in the plan, e.g. `recipe.children[2].exposureS` ('' for the whole file). */
  path: string;
  message: string;
}

export type ReadResult = { ok: true; doc: Document.Parsed; lines: LineCounter } | { ok: false; errors: PlanIssue[] };

const at = (lines: LineCounter, offset: number) => {
  const { line, col } = lines.linePos(offset);
  return { line, column: col };
};

/** Error messages of the YAML reader in our words where they are terse. */
function yamlMessage(code: string, message: string, source: string): string {
  if (code === 'DUPLICATE_KEY') return `The key ${JSON.stringify(/^[^:\n]*/.exec(source)![0].trim())} appears twice in the same mapping`;
  if (code === 'MULTIPLE_DOCS') return 'A plan is one YAML document; this file holds several (remove the second "---")';
  return message.replace(/\s+at line \d+, column \d+:[\s\S]*$/, '');
}

/**
 * Reads YAML text into a document: the cheap token guard first, then the parser (no pretty
 * errors: positions come from our line counter), then the exact size and depth of the result.
 * Duplicate keys are errors; a document with several parts is refused.
 */
export function readYaml(text: string): ReadResult {
  const lines = new LineCounter();
  const guard = prescanYaml(text, { maxDepthBound: 2 * PLAN_LIMITS.maxYamlDepth, maxValues: PLAN_LIMITS.maxYamlNodes });
  if (!guard.ok) {
    const where = lineOf(text, guard.offset);
    const message = guard.reason === 'depth' ? `The YAML is nested too deeply (a plan needs about 30 levels; at most ${PLAN_LIMITS.maxYamlDepth} are read)` : `The YAML has too many values (at most ${PLAN_LIMITS.maxYamlNodes} are read)`;
    return { ok: false, errors: [{ ...where, path: '', message }] };
  }
  let doc: Document.Parsed | null = null;
  const parser = new Parser(lines.addNewLine);
  const composer = new Composer({ version: '1.2', uniqueKeys: true });
  for (const part of composer.compose(parser.parse(text), true, text.length)) {
    if (doc) {
      doc.errors.push(new YAMLParseError([part.range[0], part.range[1]], 'MULTIPLE_DOCS', 'several documents'));
      break;
    }
    doc = part;
  }
  if (!doc) return { ok: false, errors: [{ line: 1, column: 1, path: '', message: 'The plan is empty' }] };
  if (doc.errors.length > 0) {
    const errors = doc.errors.slice(0, PLAN_LIMITS.maxIssues).map((e) => ({ ...at(lines, e.pos[0]), path: '', message: yamlMessage(e.code, e.message, text.slice(e.pos[0], e.pos[0] + 200)) }));
    return { ok: false, errors };
  }
  const size = measure(doc.contents as Node | null);
  if (size.depth > PLAN_LIMITS.maxYamlDepth) return { ok: false, errors: [{ ...at(lines, size.deepestOffset), path: '', message: `The YAML is nested ${size.depth} levels deep; at most ${PLAN_LIMITS.maxYamlDepth} are read` }] };
  if (size.nodes > PLAN_LIMITS.maxYamlNodes) return { ok: false, errors: [{ line: null, column: null, path: '', message: `The YAML has ${size.nodes} values; at most ${PLAN_LIMITS.maxYamlNodes} are read` }] };
  return { ok: true, doc, lines };
}

function lineOf(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = text.indexOf('\n'); i !== -1 && i < offset; i = text.indexOf('\n', i + 1)) {
    line++;
    start = i + 1;
  }
  return { line, column: offset - start + 1 };
}

/** Exact node count and nesting depth of a parsed document, without recursion. */
function measure(root: Node | null): { nodes: number; depth: number; deepestOffset: number } {
  let nodes = 0;
  let depth = 0;
  let deepestOffset = 0;
  const stack: { node: unknown; level: number }[] = root ? [{ node: root, level: 0 }] : [];
  while (stack.length > 0) {
    const { node, level } = stack.pop()!;
    if (isPair(node)) {
      if (node.key) stack.push({ node: node.key, level });
      if (node.value) stack.push({ node: node.value, level });
      continue;
    }
    nodes++;
    if (isMap(node) || isSeq(node)) {
      if (level + 1 > depth) {
        depth = level + 1;
        deepestOffset = node.range?.[0] ?? 0;
      }
      for (const item of node.items) stack.push({ node: item, level: level + 1 });
    }
  }
  return { nodes, depth, deepestOffset };
}

/** The first alias in the document, for pointing at it when aliases are refused. */
export function firstAliasOffset(root: Node | null): number | null {
  const stack: unknown[] = root ? [root] : [];
  while (stack.length > 0) {
    const node = stack.pop();
    if (isAlias(node)) return node.range?.[0] ?? null;
    if (isPair(node)) stack.push(node.value, node.key);
    else if (isMap(node) || isSeq(node)) for (let i = node.items.length - 1; i >= 0; i--) stack.push(node.items[i]);
  }
  return null;
}

/**
 * Line and column of the YAML node at a plan path; for a key that is missing, its nearest
 * existing parent (a required key is reported where its mapping starts).
 */
export function positionOf(doc: Document.Parsed, lines: LineCounter, path: readonly PropertyKey[]): { line: number | null; column: number | null } {
  for (let n = path.length; n >= 0; n--) {
    const node = n === 0 ? doc.contents : doc.getIn(path.slice(0, n) as (string | number)[], true);
    const range = (node as Node | undefined)?.range;
    if (range) return at(lines, range[0]);
  }
  return { line: null, column: null };
}
