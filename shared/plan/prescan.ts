import { CST, Lexer } from 'yaml';

/*
 * A guard that runs before the YAML parser: the parser and composer recurse once per nesting
 * level, and a hostile document ("[[[[…" two million times) would exhaust the stack or the CPU.
 * The lexer is iterative and cheap, so this reads its tokens once and stops at the first sign of
 * trouble. Its depth is an upper bound (each block indentation level may hold a mapping and a
 * sequence; indicators on one line nest further; flow brackets add theirs), so a document that
 * passes here is safe to parse; the exact limits are checked on the parsed document afterwards.
 */

export interface PrescanLimits {
  /** Largest nesting bound let through to the parser. */
  maxDepthBound: number;
  /** Most values (scalars, aliases, collection starts) let through to the parser. */
  maxValues: number;
}

export type PrescanResult = { ok: true } | { ok: false; offset: number; reason: 'depth' | 'size' };

const INDICATORS = new Set(['seq-item-ind', 'explicit-key-ind', 'map-value-ind']);
const CONTROL = new Set([CST.DOCUMENT, CST.SCALAR, CST.FLOW_END]);
/** Token types that start a node; plain scalars have no type (null). */
const VALUES = new Set([null, 'single-quoted-scalar', 'double-quoted-scalar', 'block-scalar-header', 'alias', 'flow-map-start', 'flow-seq-start', 'seq-item-ind']);

/** Checks the token stream of `text` against the limits; `offset` says where it stopped. */
export function prescanYaml(text: string, limits: PrescanLimits): PrescanResult {
  const indents: number[] = [];
  let flow = 0;
  let lineIndicators = 0;
  let atLineStart = true;
  let pendingIndent = 0;
  let offset = 0;
  let values = 0;
  for (const token of new Lexer().lex(text)) {
    // The lexer's own markers (document, scalar and flow-error) are not source text.
    if (CONTROL.has(token)) continue;
    const type = CST.tokenType(token);
    if (VALUES.has(type) && ++values > limits.maxValues) return { ok: false, offset, reason: 'size' };
    if (type === 'newline') {
      atLineStart = true;
      pendingIndent = 0;
      lineIndicators = 0;
    } else if (type === 'space' && atLineStart) {
      pendingIndent = token.length;
    } else if (type !== 'comment' && type !== 'byte-order-mark') {
      if (atLineStart && flow === 0) {
        while (indents.length > 0 && indents[indents.length - 1]! > pendingIndent) indents.pop();
        if (indents.length === 0 || indents[indents.length - 1]! < pendingIndent) indents.push(pendingIndent);
      }
      atLineStart = false;
      if (type === 'doc-start') indents.length = 0;
      if (type === 'flow-seq-start' || type === 'flow-map-start') flow++;
      if ((type === 'flow-seq-end' || type === 'flow-map-end') && flow > 0) flow--;
      if (type && INDICATORS.has(type) && flow === 0) lineIndicators++;
      if (2 * indents.length + lineIndicators + flow + 1 > limits.maxDepthBound) return { ok: false, offset, reason: 'depth' };
    }
    offset += token.length;
  }
  return { ok: true };
}
