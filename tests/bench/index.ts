/**
 * Speed benchmarks (`npm run bench`). Speed goals live here, never in unit tests. Each case runs
 * a warm-up, then reports the median and 95th percentile of repeated runs on this machine.
 */
import { performance } from 'node:perf_hooks';
import { computeNight } from '@/shared/ephemeris/night';
import { altAzOf } from '@/shared/ephemeris/sky';
import { darkHoursScreen, targetVisibility } from '@/shared/ephemeris/visibility';
import { parseCatalogueCsv, detectCsvLayout } from '@/shared/targets/csv-import';
import { BUILTIN_TARGETS } from '@/shared/targets/builtin';
import { searchTargets } from '@/shared/targets/search';
import { calibrationCases } from './calibration';
import { runDryRunBench } from './dry-run';

interface Case {
  name: string;
  goal: string;
  runs: number;
  fn: () => unknown;
}

const site = { latitudeDeg: 46.93, longitudeDeg: 7.62, elevationM: 870, timeZone: 'Europe/Zurich', horizon: [{ azDeg: 0, altDeg: 12 }, { azDeg: 180, altDeg: 6 }], minAltitudeDeg: 30 };
const night = computeNight(site, '2026-12-01');

// 14,000 deterministic pseudo-random positions (a linear congruential generator): the size of a full NGC/IC catalogue.
let seed = 42;
const rand = () => ((seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
const objects = Array.from({ length: 14_000 }, (_, i) => ({ designation: `XB ${i + 1}`, raDeg: rand() * 360, decDeg: Math.asin(2 * rand() - 1) * (180 / Math.PI) }));
const csv = ['designation,ra,dec,type,size,mag', ...objects.map((o) => `${o.designation},${(o.raDeg / 15).toFixed(5)},${o.decDeg.toFixed(4)},galaxy,2.5,12.1`)].join('\n');
const mapping = { ...detectCsvLayout(csv).mapping, bareRaUnit: 'hours' as const };
const bigList = [...BUILTIN_TARGETS, ...parseCatalogueCsv(csv, mapping).rows];

const cases: Case[] = [
  { name: 'computeNight (one site, one night)', goal: '< 50 ms', runs: 50, fn: () => computeNight(site, '2026-12-01') },
  { name: 'targetVisibility (145 samples, horizon)', goal: '< 50 ms', runs: 50, fn: () => targetVisibility(10.68, 41.27, site, night) },
  {
    name: 'darkHoursScreen over 14,000 objects',
    goal: '< 100 ms',
    runs: 20,
    fn: () => {
      const screen = darkHoursScreen(site, night, 30);
      let n = 0;
      for (const o of objects) if (screen(o.raDeg, o.decDeg) >= 60) n += 1;
      return n;
    },
  },
  {
    name: 'naive baseline: alt/az every 10 min for 14,000 objects',
    goal: '(reference)',
    runs: 1,
    fn: () => {
      let n = 0;
      const start = Date.parse(night.darkStart!);
      for (const o of objects.slice(0, 1400)) for (let ms = start; ms < Date.parse(night.darkEnd!); ms += 600_000) if (altAzOf(o.raDeg / 15, o.decDeg, site, new Date(ms)).altitudeDeg > 30) n += 1;
      return n; // 1/10 of the objects, scaled ×10 in the report
    },
  },
  { name: 'parseCatalogueCsv, 14,000 rows', goal: '< 1 s', runs: 5, fn: () => parseCatalogueCsv(csv, mapping) },
  { name: 'searchTargets "XB 1234" over 14,344 objects', goal: '< 50 ms', runs: 20, fn: () => searchTargets(bigList, { query: 'XB 1234' }, 50) },
  ...calibrationCases,
];

function stats(samples: number[]) {
  const s = [...samples].sort((a, b) => a - b);
  return { median: s[Math.floor(s.length / 2)]!, p95: s[Math.min(s.length - 1, Math.floor(s.length * 0.95))]! };
}

console.log(`${'case'.padEnd(58)} ${'median'.padStart(10)} ${'p95'.padStart(10)}  goal`);
for (const c of cases) {
  c.fn(); // warm-up
  const samples: number[] = [];
  for (let i = 0; i < c.runs; i += 1) {
    const t0 = performance.now();
    c.fn();
    samples.push(performance.now() - t0);
  }
  const scale = c.name.startsWith('naive') ? 10 : 1;
  const { median, p95 } = stats(samples.map((x) => x * scale));
  console.log(`${c.name.padEnd(58)} ${median.toFixed(2).padStart(8)}ms ${p95.toFixed(2).padStart(8)}ms  ${c.goal}`);
}

// The dry-run cases come last: the run ends with the three lines scripts read
// (dry-run-median-ms, scan-365-ms, speedup-vs-stepping).
runDryRunBench().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
