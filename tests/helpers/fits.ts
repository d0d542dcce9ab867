/*
 * Builds synthetic FITS files for tests: cards → 80-column text → 2880-byte blocks, with
 * switches that break the file in each way the header parser must reject.
 */

export type TestCardValue = string | number | boolean | null;

/** A card by parts, or a raw card text (padded to 80 columns). */
export type TestCard = { key: string; value?: TestCardValue; raw?: string; comment?: string } | string;

export interface BuildFitsOptions {
  /** Bytes of data after the header (a 0..255 ramp, so they are not ASCII). */
  dataBytes?: number;
  /** Leave out the END card. */
  dropEnd?: boolean;
  /** Cut the finished file to this many bytes. */
  truncateTo?: number;
  /** Put a byte (default 0xE9, "é" in Latin-1) at a 1-based card and column. */
  nonAscii?: { card: number; column: number; byte?: number };
  /** Overwrite columns 11–30 of a 1-based card with text that is no FITS value. */
  badValueAt?: number;
}

const BLOCK = 2880;

/** A value in fixed format: strings quoted from column 11 ('' for a quote), others right-aligned to column 30. */
export function formatValue(value: TestCardValue): string {
  if (typeof value === 'string') return `'${value.replace(/'/g, "''").padEnd(8)}'`;
  if (typeof value === 'boolean') return (value ? 'T' : 'F').padStart(20);
  if (value === null) return ''.padStart(20);
  return String(value).toUpperCase().padStart(20);
}

/** One 80-character card. */
export function fitsCard(card: TestCard): string {
  let text: string;
  if (typeof card === 'string') text = card;
  else if (card.value === undefined && card.raw === undefined) text = `${card.key.padEnd(8)}${card.comment ?? ''}`;
  else {
    const value = card.raw ?? formatValue(card.value ?? null);
    text = `${card.key.padEnd(8)}= ${value}${card.comment === undefined ? '' : ` / ${card.comment}`}`;
  }
  if (text.length > 80) throw new Error(`Test card longer than 80 columns: ${text}`);
  return text.padEnd(80);
}

/** SIMPLE, BITPIX, NAXIS, NAXIS1, NAXIS2, then the extra cards. */
export function imageCards(widthPx = 16, heightPx = 8, extra: TestCard[] = []): TestCard[] {
  return [
    { key: 'SIMPLE', value: true, comment: 'conforms to FITS' },
    { key: 'BITPIX', value: 16 },
    { key: 'NAXIS', value: 2 },
    { key: 'NAXIS1', value: widthPx },
    { key: 'NAXIS2', value: heightPx },
    ...extra,
  ];
}

/** A FITS file (header blocks, then optional data) as bytes. */
export function buildFits(cards: TestCard[], options: BuildFitsOptions = {}): Uint8Array {
  const lines = cards.map(fitsCard);
  if (!options.dropEnd) lines.push('END'.padEnd(80));
  while (lines.length % 36 !== 0) lines.push(' '.repeat(80));
  const header = lines.join('');
  const dataBytes = options.dataBytes ?? 0;
  const bytes = new Uint8Array(header.length + dataBytes);
  for (let i = 0; i < header.length; i++) bytes[i] = header.charCodeAt(i);
  for (let i = 0; i < dataBytes; i++) bytes[header.length + i] = i % 256;
  if (options.badValueAt !== undefined) {
    const start = (options.badValueAt - 1) * 80 + 10;
    const bad = 'NOT A VALUE'.padEnd(20);
    for (let i = 0; i < 20; i++) bytes[start + i] = bad.charCodeAt(i);
  }
  if (options.nonAscii) {
    const { card, column, byte = 0xe9 } = options.nonAscii;
    bytes[(card - 1) * 80 + (column - 1)] = byte;
  }
  return options.truncateTo === undefined ? bytes : bytes.slice(0, options.truncateTo);
}

/** Number of bytes in `blocks` whole FITS blocks. */
export function blocks(count: number): number {
  return count * BLOCK;
}
