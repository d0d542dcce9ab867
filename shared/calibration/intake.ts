import type { IntakeFrame } from '@/shared/calibration/types';

export type IntakeOutcome = { ok: true; frame: IntakeFrame } | { ok: false; name: string; reason: string; kind: string };

/**
 * One file's header bytes → a frame to record, or the reason it cannot be: the strict parser's
 * error (truncated, missing END, non-ASCII, …), or a keyword the record needs (IMAGETYP naming
 * light/dark/flat/bias, DATE-OBS, EXPTIME/EXPOSURE except for bias where it defaults to 0).
 */
export function readIntakeFile(name: string, bytes: Uint8Array): IntakeOutcome {
  void name;
  void bytes;
  throw new Error('not implemented');
}

/** The night (evening date) a frame taken at `takenAtIso` belongs to in `timeZone`. */
export function frameNightDate(takenAtIso: string, timeZone: string): string {
  void takenAtIso;
  void timeZone;
  throw new Error('not implemented');
}
