/*
 * An upload's progress for a progress bar and its caption. Pure, so the unit tests read it directly.
 */

/** Bytes sent of a body, as an upload reports them (`lib/upload`). */
export type BytesProgress = { loadedBytes: number; totalBytes: number };

/**
 * An upload's share in words and numbers: `started` once the first bytes went (before that the
 * size may not be known yet), `sent` once all did and the server is at work.
 */
export function uploadShare(progress: BytesProgress | null): { fraction: number; loadedBytes: number; totalBytes: number; started: boolean; sent: boolean } {
  const totalBytes = Math.max(1, progress?.totalBytes ?? 1);
  const loadedBytes = Math.min(totalBytes, Math.max(0, progress?.loadedBytes ?? 0));
  return { fraction: loadedBytes / totalBytes, loadedBytes, totalBytes, started: loadedBytes > 0, sent: loadedBytes >= totalBytes };
}
