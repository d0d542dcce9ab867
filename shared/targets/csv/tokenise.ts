/*
 * A small RFC 4180-style CSV reader: one delimiter (comma, semicolon or tab), fields optionally in
 * double quotes with "" for a quote, quoted fields may hold delimiters and line breaks, CRLF or
 * LF line ends, an optional UTF-8 byte-order mark. Each record keeps the 1-based line number it
 * starts on, so errors can point into the file as an editor shows it.
 */

export type CsvDelimiter = ',' | ';' | '\t';

export interface CsvRecord {
  /** 1-based line of the file where the record starts. */
  line: number;
  fields: string[];
}

export interface CsvReadResult {
  records: CsvRecord[];
  /** Line of an opening quote that never closes, if any (the rest of the file is one field). */
  unclosedQuoteLine: number | null;
}

const QUOTE = 34;
const LF = 10;
const CR = 13;

/** Reads a quoted field starting at the opening quote; returns the value, the next index and the line count inside. */
function readQuoted(text: string, start: number): { value: string; next: number; newlines: number; closed: boolean } {
  let value = '';
  let from = start + 1;
  let newlines = 0;
  for (;;) {
    const q = text.indexOf('"', from);
    const end = q < 0 ? text.length : q;
    const chunk = text.slice(from, end);
    for (let k = chunk.indexOf('\n'); k >= 0; k = chunk.indexOf('\n', k + 1)) newlines++;
    value += chunk;
    if (q < 0) return { value, next: text.length, newlines, closed: false };
    if (text.charCodeAt(q + 1) === QUOTE) {
      value += '"';
      from = q + 2;
      continue;
    }
    return { value, next: q + 1, newlines, closed: true };
  }
}

/** Splits CSV text into records. Empty lines are skipped; line numbers still count them. */
export function readCsvRecords(text: string, delimiter: CsvDelimiter): CsvReadResult {
  const delim = delimiter.charCodeAt(0);
  const records: CsvRecord[] = [];
  let unclosedQuoteLine: number | null = null;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  let line = 1;
  while (i < text.length) {
    const startLine = line;
    const fields: string[] = [];
    let endOfRecord = false;
    while (!endOfRecord) {
      if (text.charCodeAt(i) === QUOTE) {
        const q = readQuoted(text, i);
        if (!q.closed && unclosedQuoteLine === null) unclosedQuoteLine = line;
        line += q.newlines;
        let after = q.next;
        // Text between a closing quote and the delimiter is kept, as spreadsheets do.
        let tail = '';
        while (after < text.length && text.charCodeAt(after) !== delim && text.charCodeAt(after) !== LF) tail += text[after++];
        fields.push(q.value + tail.replace(/\r$/, ''));
        i = after;
      } else {
        let j = i;
        while (j < text.length) {
          const c = text.charCodeAt(j);
          if (c === delim || c === LF) break;
          j++;
        }
        const end = j > i && text.charCodeAt(j - 1) === CR ? j - 1 : j;
        fields.push(text.slice(i, end));
        i = j;
      }
      if (i >= text.length || text.charCodeAt(i) === LF) {
        endOfRecord = true;
        if (i < text.length) line++;
      }
      i++;
    }
    if (!(fields.length === 1 && fields[0]?.trim() === '')) records.push({ line: startLine, fields });
  }
  return { records, unclosedQuoteLine };
}

/** The delimiter that splits the header line into the most fields (quotes respected); comma on a tie. */
export function guessDelimiter(text: string): CsvDelimiter {
  const firstLine = text.replace(/^\uFEFF/, '').split('\n', 1)[0] ?? '';
  let best: CsvDelimiter = ',';
  let bestCount = 0;
  for (const d of [',', ';', '\t'] as const) {
    let count = 0;
    let quoted = false;
    for (const ch of firstLine) {
      if (ch === '"') quoted = !quoted;
      else if (ch === d && !quoted) count++;
    }
    if (count > bestCount) {
      best = d;
      bestCount = count;
    }
  }
  return best;
}
