/**
 * Dry-run speed (dry-run.md "Speed"): the reference recipe (8 stages, > 1,000 frames, a night of
 * about ten dark hours) must run in well under a tenth of a second, and a 365-night scan in a
 * few seconds, beside the naive per-second stepping simulator of the tests as a baseline.
 * Runnable alone (`node --import tsx tests/bench/dry-run.ts`) or through `runDryRunBench()`.
 */
import { performance } from 'node:perf_hooks';
import { runDryRun, scanNights } from '@/shared/dry-run';
import { referenceInput } from '@/tests/helpers/dry-run-reference';
import { stepNight } from '@/tests/helpers/stepping-simulator';

export interface DryRunBench {
  medianMs: number;
  p95Ms: number;
  frames: number;
  events: number;
  scan365Ms: number;
  steppingMs: number;
  speedup: number;
}

const RUNS = 40;

function timeMs(fn: () => unknown): number {
  const t0 = performance.now();
  fn();
  return performance.now() - t0;
}

/** Runs the cases, prints a table, and ends with the three summary lines the bench index reads. */
export async function runDryRunBench(): Promise<DryRunBench> {
  const input = referenceInput();
  const first = runDryRun(input); // warm-up
  const frames = first.timeline.reduce((s, e) => s + (e.kind === 'expose' ? (e.frames ?? 0) : 0), 0);
  const samples = Array.from({ length: RUNS }, () => timeMs(() => runDryRun(input))).sort((a, b) => a - b);
  const medianMs = samples[Math.floor(RUNS / 2)]!;
  const p95Ms = samples[Math.min(RUNS - 1, Math.floor(RUNS * 0.95))]!;
  const scan365Ms = timeMs(() => scanNights(input, '2026-01-01', 365));
  const steppingMs = timeMs(() => stepNight(input));
  const speedup = steppingMs / medianMs;
  const row = (name: string, value: string, goal: string) => console.log(`${name.padEnd(58)} ${value.padStart(12)}  ${goal}`);
  console.log(`dry run of the reference recipe: ${frames} frames, ${first.timeline.length} events, ${first.sky.darkHours.toFixed(1)} h of darkness`);
  row('runDryRun, reference recipe (median of 40)', `${medianMs.toFixed(2)} ms`, '< 50 ms');
  row('runDryRun, reference recipe (p95)', `${p95Ms.toFixed(2)} ms`, '');
  row('scanNights, 365 nights', `${scan365Ms.toFixed(0)} ms`, 'a few seconds');
  row('naive baseline: per-second stepping simulator, one night', `${steppingMs.toFixed(0)} ms`, '(reference)');
  console.log(`dry-run-median-ms: ${medianMs.toFixed(2)}`);
  console.log(`scan-365-ms: ${scan365Ms.toFixed(0)}`);
  console.log(`speedup-vs-stepping: ${speedup.toFixed(0)}`);
  return { medianMs, p95Ms, frames, events: first.timeline.length, scan365Ms, steppingMs, speedup };
}

// Run when started as a script, not when imported by the bench index.
if (/tests[\\/]bench[\\/]dry-run\.ts$/.test(process.argv[1] ?? '')) {
  runDryRunBench().catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  });
}
