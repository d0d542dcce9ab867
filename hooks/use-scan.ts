import { useCallback, useEffect, useReducer, useRef } from 'react';

import { initialScanState, nightsPayload, scanReducer, type ScanState } from '@/components/dry-run/scan-state';
import { withQuery } from '@/lib/api';
import { openEventStream, type EventStream } from '@/lib/event-stream';

/** The server's limit for one scan (`scanQuerySchema`). */
export const MAX_SCAN_NIGHTS = 366;

export type ScanRequest = { from: string; nights: number; siteId?: string; rigId?: string };

export type Scan = {
  state: ScanState;
  start: (request: ScanRequest) => void;
  /** Closes the stream, which stops the scan on the server; the nights so far stay. */
  cancel: () => void;
};

/**
 * Dry-runs a recipe on many nights through `GET /api/recipes/:id/scan` (Server-Sent Events).
 * Not a query: the answer arrives in chunks and is not cached. Leaving the screen cancels.
 */
export function useScan(recipeId: string): Scan {
  const [state, dispatch] = useReducer(scanReducer, initialScanState);
  const stream = useRef<EventStream | null>(null);

  const stop = useCallback(() => {
    stream.current?.close();
    stream.current = null;
  }, []);

  const start = useCallback(
    ({ from, nights, siteId, rigId }: ScanRequest) => {
      stop();
      const total = Math.max(1, Math.min(MAX_SCAN_NIGHTS, Math.round(nights)));
      dispatch({ type: 'start', from, total });
      const url = withQuery(`/api/recipes/${encodeURIComponent(recipeId)}/scan`, { from, nights: String(total), siteId, rigId });
      stream.current = openEventStream(url, {
        events: {
          nights: (data) => {
            const payload = nightsPayload(data);
            if (payload) dispatch({ type: 'nights', ...payload });
          },
          done: () => dispatch({ type: 'done' }),
        },
        finalEvent: 'done',
        onError: (message) => dispatch({ type: 'error', message }),
      });
    },
    [recipeId, stop],
  );

  const cancel = useCallback(() => {
    stop();
    dispatch({ type: 'cancel' });
  }, [stop]);

  useEffect(() => stop, [stop]);

  return { state, start, cancel };
}
