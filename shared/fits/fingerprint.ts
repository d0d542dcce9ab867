import type { FitsLookup } from '@/shared/fits/header';

/*
 * A stable identity for a frame, so that the same file imported twice (or renamed, or copied
 * by another tool that keeps the header) is recognised.
 */

/** Cards that identify one exposure; values are compared after normalisation. */
export const FINGERPRINT_KEYWORDS = [
  'NAXIS1',
  'NAXIS2',
  'BITPIX',
  'DATE-OBS',
  'EXPTIME',
  'EXPOSURE',
  'IMAGETYP',
  'OBJECT',
  'FILTER',
  'INSTRUME',
  'GAIN',
  'OFFSET',
  'XBINNING',
  'YBINNING',
] as const;

const FNV64_OFFSET = 0xcbf29ce484222325n;
const FNV64_PRIME = 0x100000001b3n;
const MASK64 = 0xffffffffffffffffn;

/**
 * FNV-1a, 64-bit (Fowler, Noll, Vo; offset basis 0xcbf29ce484222325, prime 0x100000001b3) of
 * the UTF-8 bytes of `text`, as 16 hex digits. Not cryptographic; enough to tell frames apart.
 */
export function fnv1a64Hex(text: string): string {
  let hash = FNV64_OFFSET;
  for (const byte of new TextEncoder().encode(text)) {
    hash ^= BigInt(byte);
    hash = (hash * FNV64_PRIME) & MASK64;
  }
  return hash.toString(16).padStart(16, '0');
}

function canonical(value: unknown): string {
  if (typeof value === 'boolean') return value ? 'T' : 'F';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return value.trim();
  return '';
}

/**
 * The identifying cards present in the header as `KEY=value` lines in a fixed order; numbers in
 * their shortest form, so `1.2D2` and `120.0` agree.
 */
export function headerFingerprintSource(h: FitsLookup): string {
  const lines: string[] = [];
  for (const key of FINGERPRINT_KEYWORDS) {
    const value = h.get(key);
    if (value !== undefined) lines.push(`${key}=${canonical(value)}`);
  }
  return lines.join('\n');
}

/** FNV-1a 64-bit hash of `headerFingerprintSource`: 16 hex digits. */
export function headerFingerprint(h: FitsLookup): string {
  return fnv1a64Hex(headerFingerprintSource(h));
}
