/*
 * One 80-character header card (FITS Standard 4.0, section 4: keyword in columns 1–8, value
 * indicator "= " in 9–10, value from 11, optional "/ comment").
 */

/** A parsed value: null is the standard's "undefined value" (a blank value field). */
export type FitsValue = string | number | boolean | null;

/** `none`: a card without a value (COMMENT, HISTORY, blank keyword, no value indicator). */
export type FitsValueKind = 'string' | 'logical' | 'integer' | 'float' | 'complex' | 'undefined' | 'none';

export type FitsHeaderErrorKind = 'not-fits' | 'truncated' | 'missing-end' | 'non-ascii' | 'malformed-keyword' | 'malformed-value';

/** Why a header was rejected; `card` is the 1-based card number when one card is at fault. */
export class FitsHeaderError extends Error {
  readonly kind: FitsHeaderErrorKind;
  readonly card: number | undefined;

  constructor(kind: FitsHeaderErrorKind, message: string, card?: number) {
    super(message);
    this.name = 'FitsHeaderError';
    this.kind = kind;
    this.card = card;
  }
}

export interface FitsCard {
  /** 1-based position of the card in the header. */
  index: number;
  keyword: string;
  kind: FitsValueKind;
  /** The value; undefined for cards without one and for complex values (not read). */
  value?: FitsValue;
  /** Text after "/" on a value card, or columns 9–80 of a commentary card, trailing blanks removed. */
  comment?: string;
  /** The card's 80 characters as read. */
  text: string;
}

const KEYWORD = /^[A-Z0-9_-]*$/;
const INTEGER = /^[+-]?\d+$/;
const FLOAT = /^[+-]?(\d+\.\d*|\.\d+|\d+)([EeDd][+-]?\d+)?$/;
const COMPLEX = /^\(\s*[^,()]+,\s*[^,()]+\)$/;
const COMMENTARY = new Set(['COMMENT', 'HISTORY', '']);

type ParsedValue = Pick<FitsCard, 'kind' | 'value' | 'comment'>;

function malformed(card: number, keyword: string, why: string): FitsHeaderError {
  return new FitsHeaderError('malformed-value', `Card ${card} (${keyword || 'blank keyword'}): ${why}`, card);
}

/**
 * A quoted string: '' inside is one quote; leading blanks count, trailing blanks do not, and a
 * string of only blanks is one blank (FITS 4.0 §4.2.1.1).
 */
function parseString(rest: string, card: number, keyword: string): ParsedValue {
  let out = '';
  let i = 1;
  for (;;) {
    const q = rest.indexOf("'", i);
    if (q < 0) throw malformed(card, keyword, 'the string has no closing quote');
    out += rest.slice(i, q);
    i = q + 1;
    if (rest[i] !== "'") break;
    out += "'";
    i += 1;
  }
  const after = rest.slice(i).trim();
  if (after !== '' && !after.startsWith('/')) throw malformed(card, keyword, `unexpected text "${after}" after the closing quote`);
  const trimmed = out.trimEnd();
  return { kind: 'string', value: trimmed === '' && out !== '' ? ' ' : trimmed, comment: after ? after.slice(1).trim() : undefined };
}

/** Columns 11–80 of a value card: string, logical, integer, float (E or D exponent), complex or blank. */
export function parseValueField(field: string, card: number, keyword: string): ParsedValue {
  const rest = field.trimStart();
  if (rest.startsWith("'")) return parseString(rest, card, keyword);
  const slash = rest.indexOf('/');
  const text = (slash < 0 ? rest : rest.slice(0, slash)).trim();
  const comment = slash < 0 ? undefined : rest.slice(slash + 1).trim();
  if (text === '') return { kind: 'undefined', value: null, comment };
  if (text === 'T' || text === 'F') return { kind: 'logical', value: text === 'T', comment };
  if (INTEGER.test(text)) return { kind: 'integer', value: Number(text), comment };
  if (FLOAT.test(text)) return { kind: 'float', value: Number(text.replace(/[Dd]/, 'E')), comment };
  if (COMPLEX.test(text)) return { kind: 'complex', comment };
  throw malformed(card, keyword, `"${text}" is not a string, T/F, integer or floating-point value`);
}

/** Checks one card's bytes are printable ASCII (0x20–0x7E) and returns its text. */
export function cardText(bytes: Uint8Array, offset: number, card: number): string {
  let text = '';
  for (let col = 0; col < 80; col++) {
    const b = bytes[offset + col]!;
    if (b < 0x20 || b > 0x7e) {
      const hex = b.toString(16).toUpperCase().padStart(2, '0');
      throw new FitsHeaderError('non-ascii', `Card ${card}, column ${col + 1}: byte 0x${hex} is not printable ASCII (a FITS header is ASCII text)`, card);
    }
    text += String.fromCharCode(b);
  }
  return text;
}

/** Parses one card's text; CONTINUE cards keep their string for `mergeContinued`. */
export function parseCard(text: string, index: number): FitsCard {
  const keyword = text.slice(0, 8).trimEnd();
  if (!KEYWORD.test(keyword)) {
    throw new FitsHeaderError('malformed-keyword', `Card ${index}: keyword "${keyword}" may only use A–Z, 0–9, "-" and "_", left-justified in columns 1–8`, index);
  }
  if (keyword === 'CONTINUE') {
    const field = text.slice(10);
    if (text.slice(8, 10) === '  ' && field.trimStart().startsWith("'")) return { index, keyword, text, ...parseValueField(field, index, keyword) };
  }
  if (COMMENTARY.has(keyword) || text.slice(8, 10) !== '= ') {
    return { index, keyword, kind: 'none', comment: text.slice(8).trimEnd(), text };
  }
  return { index, keyword, text, ...parseValueField(text.slice(10), index, keyword) };
}

/**
 * Long-string convention (FITS 4.0 §4.2.1.2): a string ending in "&" continues in the string of
 * the next CONTINUE card. Joins the pieces into the first card; the CONTINUE cards stay listed.
 */
export function mergeContinued(cards: FitsCard[]): void {
  for (let i = 0; i < cards.length; i++) {
    const head = cards[i]!;
    if (head.kind !== 'string' || head.keyword === 'CONTINUE') continue;
    let value = head.value as string;
    let j = i + 1;
    while (value.endsWith('&') && cards[j]?.keyword === 'CONTINUE' && cards[j]!.kind === 'string') {
      value = value.slice(0, -1) + (cards[j]!.value as string);
      j += 1;
    }
    head.value = value;
    i = j - 1;
  }
}
