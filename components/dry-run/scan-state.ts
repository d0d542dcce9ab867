import type { NightScan } from '@/shared/dry-run/scan';

export type { NightScan };

/** Where a scan of many nights is: never started, streaming, finished, stopped by the user or broken. */
export type ScanStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'error';

export type ScanState = {
  status: ScanStatus;
  /** First night and number of nights asked for. */
  from: string | null;
  total: number;
  done: number;
  nights: NightScan[];
  error: string | null;
};

export type ScanAction =
  | { type: 'start'; from: string; total: number }
  | { type: 'nights'; done: number; total: number; nights: NightScan[] }
  | { type: 'done' }
  | { type: 'cancel' }
  | { type: 'error'; message: string };

export const initialScanState: ScanState = { status: 'idle', from: null, total: 0, done: 0, nights: [], error: null };

/** The scan's state machine: chunks of nights arrive in order and are appended. */
export function scanReducer(state: ScanState, action: ScanAction): ScanState {
  switch (action.type) {
    case 'start':
      return { status: 'running', from: action.from, total: action.total, done: 0, nights: [], error: null };
    case 'nights':
      if (state.status !== 'running') return state;
      return { ...state, done: Math.min(action.done, action.total), total: action.total, nights: [...state.nights, ...action.nights] };
    case 'done':
      return state.status === 'running' ? { ...state, status: 'done', done: state.total } : state;
    case 'cancel':
      return state.status === 'running' ? { ...state, status: 'cancelled' } : state;
    case 'error':
      return state.status === 'running' ? { ...state, status: 'error', error: action.message } : state;
  }
}

/** The `data` of an `event: nights` message, checked just enough to trust its shape. */
export function nightsPayload(data: unknown): { done: number; total: number; nights: NightScan[] } | null {
  if (!data || typeof data !== 'object') return null;
  const d = data as { done?: unknown; total?: unknown; nights?: unknown };
  if (typeof d.done !== 'number' || typeof d.total !== 'number' || !Array.isArray(d.nights)) return null;
  return { done: d.done, total: d.total, nights: d.nights as NightScan[] };
}

/** 0..1 for the progress bar. */
export function scanFraction(state: Pick<ScanState, 'done' | 'total'>): number {
  return state.total > 0 ? Math.min(1, state.done / state.total) : 0;
}

/**
 * The best nights of a scan: nights without a stop finding first, then the most usable
 * integration (shutter time with no sky finding), then fewer warnings, then the earlier date.
 */
export function bestNights(nights: readonly NightScan[], count = 5): NightScan[] {
  return nights
    .filter((n) => n.usableIntegrationS > 0)
    .sort(
      (a, b) =>
        Number(a.findings.stop > 0) - Number(b.findings.stop > 0) ||
        b.usableIntegrationS - a.usableIntegrationS ||
        a.findings.warn - b.findings.warn ||
        a.date.localeCompare(b.date),
    )
    .slice(0, count);
}
