import { cardText, FitsHeaderError, mergeContinued, parseCard, type FitsCard, type FitsValue } from '@/shared/fits/card';

export { FitsHeaderError } from '@/shared/fits/card';
export type { FitsCard, FitsHeaderErrorKind, FitsValue, FitsValueKind } from '@/shared/fits/card';

/** FITS Standard 4.0 §3.1: headers come in 2880-byte blocks of 36 cards of 80 characters. */
export const FITS_BLOCK_BYTES = 2880;
export const FITS_CARD_BYTES = 80;
const CARDS_PER_BLOCK = FITS_BLOCK_BYTES / FITS_CARD_BYTES;

export interface FitsHeader {
  /** Every card up to and including END, in order. */
  cards: FitsCard[];
  /** Value of the first card with this keyword (case-insensitive); undefined when absent or valueless. */
  get(keyword: string): FitsValue | undefined;
  /** Length of the header in bytes (whole blocks, END included): where the data starts. */
  headerBytes: number;
}

/** Anything with a `get`, so WCS and frame readers also accept a plain lookup in tests. */
export type FitsLookup = Pick<FitsHeader, 'get'>;

function startsWith(bytes: Uint8Array, offset: number, text: string): boolean {
  for (let i = 0; i < text.length; i++) if (bytes[offset + i] !== text.charCodeAt(i)) return false;
  return true;
}

function isEndCard(bytes: Uint8Array, offset: number): boolean {
  return startsWith(bytes, offset, 'END     ');
}

/** Rejects input that does not start like a FITS header (SIMPLE or XTENSION in columns 1–8). */
function checkSignature(bytes: Uint8Array): void {
  if (startsWith(bytes, 0, 'SIMPLE  ') || startsWith(bytes, 0, 'XTENSION')) return;
  throw new FitsHeaderError('not-fits', 'Not a FITS file: the first card must be SIMPLE (or XTENSION for an extension)', 1);
}

/**
 * Parses a FITS header (FITS Standard 4.0 §3–4) from the start of a file: whole 2880-byte
 * blocks of 36 cards until the END card. Throws FitsHeaderError for a truncated block, a
 * missing END, non-ASCII bytes, a malformed keyword or a malformed value, naming the card.
 * Reads a Uint8Array only (no Buffer), so it runs the same in the browser and on Node.
 */
export function parseFitsHeader(bytes: Uint8Array): FitsHeader {
  checkSignature(bytes);
  const cards: FitsCard[] = [];
  for (let n = 0; ; n++) {
    const offset = n * FITS_CARD_BYTES;
    const block = Math.floor(n / CARDS_PER_BLOCK);
    if (n % CARDS_PER_BLOCK === 0) checkBlock(bytes, block);
    const card = parseCard(cardText(bytes, offset, n + 1), n + 1);
    cards.push(card);
    if (card.keyword === 'END') {
      mergeContinued(cards);
      return makeHeader(cards, (block + 1) * FITS_BLOCK_BYTES);
    }
  }
}

function checkBlock(bytes: Uint8Array, block: number): void {
  const start = block * FITS_BLOCK_BYTES;
  if (bytes.length === start) {
    throw new FitsHeaderError('missing-end', `No END card: the header stops after ${block} block(s) (${block * CARDS_PER_BLOCK} cards) without one`);
  }
  if (bytes.length < start + FITS_BLOCK_BYTES) {
    throw new FitsHeaderError(
      'truncated',
      `Truncated file: header block ${block + 1} has ${bytes.length - start} of ${FITS_BLOCK_BYTES} bytes`,
      block * CARDS_PER_BLOCK + 1,
    );
  }
}

function makeHeader(cards: FitsCard[], headerBytes: number): FitsHeader {
  const first = new Map<string, FitsValue>();
  for (const c of cards) {
    if (c.value !== undefined && c.keyword !== 'CONTINUE' && !first.has(c.keyword)) first.set(c.keyword, c.value);
  }
  return { cards, headerBytes, get: (keyword) => first.get(keyword.trim().toUpperCase()) };
}

/**
 * Header length in bytes if the END card lies in the complete blocks of `prefix`, else null
 * (read another block). Lets a client read only the header slices of a large file.
 */
export function headerByteLength(prefix: Uint8Array): number | null {
  if (prefix.length >= 8) checkSignature(prefix);
  const blocks = Math.floor(prefix.length / FITS_BLOCK_BYTES);
  for (let b = 0; b < blocks; b++) {
    for (let c = 0; c < CARDS_PER_BLOCK; c++) {
      if (isEndCard(prefix, b * FITS_BLOCK_BYTES + c * FITS_CARD_BYTES)) return (b + 1) * FITS_BLOCK_BYTES;
    }
  }
  return null;
}

/** Reads bytes [start, end) of a file; may return fewer at the end of the file. */
export type ReadSlice = (start: number, end: number) => Promise<Uint8Array>;

/**
 * Reads just the header of a large file through `readSlice` (e.g. `File.slice().arrayBuffer()`
 * in the browser), a few blocks at a time until END, and returns those bytes for
 * `parseFitsHeader`. At end of file it returns what it has, so the parser names the fault.
 */
export async function readFitsHeaderBytes(readSlice: ReadSlice, maxBlocks = 400): Promise<Uint8Array> {
  const chunkBlocks = 4;
  let have = new Uint8Array(0);
  while (have.length < maxBlocks * FITS_BLOCK_BYTES) {
    const chunk = await readSlice(have.length, have.length + chunkBlocks * FITS_BLOCK_BYTES);
    const next = new Uint8Array(have.length + chunk.length);
    next.set(have);
    next.set(chunk, have.length);
    have = next;
    const length = headerByteLength(have);
    if (length !== null) return have.slice(0, length);
    if (chunk.length < chunkBlocks * FITS_BLOCK_BYTES) return have;
  }
  throw new FitsHeaderError('missing-end', `No END card in the first ${maxBlocks} header blocks`);
}
