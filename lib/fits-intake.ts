/**
 * Reading picked FITS files for intake: only each file's header blocks are read (a 60 MB frame
 * costs a few kB), base64-encoded and sent together in one request, so an import is all or
 * nothing. Files that do not parse still send their first block: the server names the fault.
 */
import { FITS_BLOCK_BYTES, FitsHeaderError, readFitsHeaderBytes } from '@/shared/fits/header';
import { INTAKE_MAX_HEADER_BYTES } from '@/shared/schemas/calibration-api';

/** File name endings taken from a folder; anything else in it is skipped and counted. */
export const FITS_EXTENSIONS = ['.fits', '.fit', '.fts'] as const;

/** The file chooser's `accept` for FITS frames. */
export const FITS_ACCEPT = FITS_EXTENSIONS.join(',');

/** How many files are read at once: enough to hide disk latency, few enough to stay smooth. */
export const READ_CONCURRENCY = 4;

/** The longest name the API takes (the end of a long path is kept: it names the file). */
const MAX_NAME_CHARS = 260;

/** The picked file as intake needs it (a browser `File` fits). */
export type IntakeSource = {
  name: string;
  size: number;
  webkitRelativePath?: string;
  slice(start?: number, end?: number): { arrayBuffer(): Promise<ArrayBuffer> };
};

export type IntakeFile = { name: string; headerBase64: string };

/** A file refused before sending (nothing to send), shown with the server's refusals. */
export type LocalReject = { name: string; reason: string; kind: string };

export function isFitsName(name: string): boolean {
  const lower = name.toLowerCase();
  return FITS_EXTENSIONS.some((ext) => lower.endsWith(ext));
}

/** A folder's FITS files, and how many other files it held (notes, previews, sidecar files). */
export function splitFitsFiles<T extends { name: string }>(files: readonly T[]): { fits: T[]; skipped: number } {
  const fits = files.filter((f) => isFitsName(f.name));
  return { fits, skipped: files.length - fits.length };
}

/** The name shown for a file: its path inside the picked folder when there is one. */
export function intakeName(file: Pick<IntakeSource, 'name' | 'webkitRelativePath'>): string {
  const name = file.webkitRelativePath || file.name || 'unnamed';
  return name.length > MAX_NAME_CHARS ? `…${name.slice(name.length - MAX_NAME_CHARS + 1)}` : name;
}

const BASE64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';

/** Standard base64 (RFC 4648 §4, with padding) of bytes; no Buffer, no btoa, same on every platform. */
export function toBase64(bytes: Uint8Array): string {
  let out = '';
  let i = 0;
  for (; i + 2 < bytes.length; i += 3) {
    const n = (bytes[i]! << 16) | (bytes[i + 1]! << 8) | bytes[i + 2]!;
    out += BASE64[(n >> 18) & 63]! + BASE64[(n >> 12) & 63]! + BASE64[(n >> 6) & 63]! + BASE64[n & 63]!;
  }
  const rest = bytes.length - i;
  if (rest === 1) {
    const n = bytes[i]! << 16;
    out += `${BASE64[(n >> 18) & 63]!}${BASE64[(n >> 12) & 63]!}==`;
  } else if (rest === 2) {
    const n = (bytes[i]! << 16) | (bytes[i + 1]! << 8);
    out += `${BASE64[(n >> 18) & 63]!}${BASE64[(n >> 12) & 63]!}${BASE64[(n >> 6) & 63]!}=`;
  }
  return out;
}

/**
 * Runs `task` over `items` with at most `limit` running at once and returns the results in the
 * items' order; `onDone` gets the count finished so far after each one.
 */
export async function mapLimited<T, R>(items: readonly T[], limit: number, task: (item: T, index: number) => Promise<R>, onDone?: (done: number) => void): Promise<R[]> {
  const results = new Array<R>(items.length);
  let next = 0;
  let done = 0;
  async function worker() {
    while (next < items.length) {
      const index = next++;
      results[index] = await task(items[index]!, index);
      done++;
      onDone?.(done);
    }
  }
  await Promise.all(Array.from({ length: Math.min(Math.max(1, limit), items.length) }, worker));
  return results;
}

async function readSlice(file: IntakeSource, start: number, end: number): Promise<Uint8Array> {
  return new Uint8Array(await file.slice(start, end).arrayBuffer());
}

/**
 * A file's header bytes (through the END card's block, at most the API's 40 blocks). When the
 * file is no valid FITS header (not FITS, truncated, no END in time) its first block or less is
 * returned instead, so the server reads it and names the fault in the result.
 */
export async function readIntakeHeader(file: IntakeSource): Promise<Uint8Array> {
  const maxBlocks = INTAKE_MAX_HEADER_BYTES / FITS_BLOCK_BYTES;
  try {
    return await readFitsHeaderBytes((start, end) => readSlice(file, start, end), maxBlocks);
  } catch (e) {
    if (!(e instanceof FitsHeaderError)) throw e;
    return readSlice(file, 0, Math.min(file.size, FITS_BLOCK_BYTES));
  }
}

/** Every file's header, read a few at a time; empty files cannot be sent and are refused here. */
export async function prepareIntake(files: readonly IntakeSource[], onRead?: (done: number) => void): Promise<{ files: IntakeFile[]; localRejects: LocalReject[] }> {
  const read = await mapLimited(
    files,
    READ_CONCURRENCY,
    async (file): Promise<IntakeFile | LocalReject> => {
      const name = intakeName(file);
      if (file.size === 0) return { name, reason: 'The file is empty', kind: 'empty' };
      try {
        const bytes = await readIntakeHeader(file);
        if (bytes.length === 0) return { name, reason: 'The file is empty', kind: 'empty' };
        return { name, headerBase64: toBase64(bytes) };
      } catch {
        return { name, reason: 'The file could not be read from the disk', kind: 'unreadable' };
      }
    },
    onRead,
  );
  return {
    files: read.filter((r): r is IntakeFile => 'headerBase64' in r),
    localRejects: read.filter((r): r is LocalReject => 'reason' in r),
  };
}
