import { OVERHEAD_KINDS } from '@/shared/dry-run/result-schema';
import type { DryRunFinding, FindingCode, OverheadKind, TimelineEvent } from '@/shared/dry-run/types';

/** A finding as the engine raises it; `key` (default code + node) reports it once. */
export interface FindingDraft {
  code: FindingCode;
  severity: DryRunFinding['severity'];
  ms: number | null;
  nodeId: string | null;
  message: string;
  fix: string;
  key?: string;
}

/**
 * The settings a dark must share with the lights it calibrates (trade-defaults.md "darks match
 * on", S17, S44): the key of the dry run's dark matching and of the library's grouped sets.
 */
export interface DarkMatchKey {
  exposureS: number;
  gain: number | null;
  offset: number | null;
  binning: number;
  readoutMode: string | null;
  temperatureC: number;
}

/** Light frames of one kind, for the darks the night needs. */
export interface LightUse extends DarkMatchKey {
  nodeId: string;
  frames: number;
}

const iso = (ms: number) => new Date(Math.round(ms)).toISOString();

/** Collects what the run produces: findings, overheads, integration, stage ends, slack. */
export class Recorder {
  readonly timeline: TimelineEvent[] = [];
  readonly findings: DryRunFinding[] = [];
  private readonly seen = new Set<string>();
  readonly overhead = Object.fromEntries(OVERHEAD_KINDS.map((k) => [k, 0])) as Record<OverheadKind, number>;
  shutterS = 0;
  usableS = 0;
  readonly integration = new Map<string, Map<string, { frames: number; seconds: number }>>();
  readonly stageFinish: { nodeId: string; start: string | null; end: string | null }[] = [];
  readonly slack: { nodeId: string; fixedAt: string; slackS: number }[] = [];
  readonly lights: LightUse[] = [];
  /** A sky-flats step runs in the morning twilight (then parking after sunrise is expected). */
  dawnSkyFlats = false;
  /** Dark sets a darks step takes tonight. */
  readonly darksTaken: DarkMatchKey[] = [];

  constructor(private readonly paths: Map<string, string>) {}

  /** Adds a finding unless one with the same key was raised; true when added. */
  finding(d: FindingDraft): boolean {
    const key = d.key ?? `${d.code}|${d.nodeId ?? ''}`;
    if (this.seen.has(key)) return false;
    this.seen.add(key);
    const path = d.nodeId === null ? null : (this.paths.get(d.nodeId) ?? null);
    this.findings.push({ code: d.code, severity: d.severity, time: d.ms === null ? null : iso(d.ms), nodeId: d.nodeId, path, message: d.message, fix: d.fix });
    return true;
  }

  addOverhead(kind: OverheadKind, seconds: number): void {
    this.overhead[kind] += seconds;
  }

  addIntegration(targetId: string, filter: string, frames: number, seconds: number): void {
    let byFilter = this.integration.get(targetId);
    if (!byFilter) this.integration.set(targetId, (byFilter = new Map()));
    const t = byFilter.get(filter) ?? { frames: 0, seconds: 0 };
    byFilter.set(filter, { frames: t.frames + frames, seconds: t.seconds + seconds });
  }

  addSlack(nodeId: string, fixedMs: number, arrivedMs: number): void {
    this.slack.push({ nodeId, fixedAt: iso(fixedMs), slackS: Math.round((fixedMs - arrivedMs) / 1000) });
  }

  addStageFinish(nodeId: string, startMs: number | null, endMs: number | null): void {
    this.stageFinish.push({ nodeId, start: startMs === null ? null : iso(startMs), end: endMs === null ? null : iso(endMs) });
  }
}
