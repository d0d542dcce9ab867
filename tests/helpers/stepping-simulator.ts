/**
 * An independent, deliberately naive dry run for tests: a clock that advances one second at a
 * time, asking the ephemeris primitives (`altAzOf`, `hourAngleH`, `sunAltitudeDeg`,
 * `moonAltitudeDeg`, `moonSeparationDeg`) about every second it needs. It shares only the
 * duration models (each tested on its own with worked numbers) and the static checks with the
 * engine; event finding, windows, altitude limits, the meridian and the findings are its own.
 * Slow is fine. It supports the recipe parts a realistic night uses: cool, warm, slew to the
 * stage target, centre, focus, guide, a `flip` meridian policy, expose, wait (sun event, clock,
 * duration), park; stages with notBefore/endBy and the minimum altitude; repeats by count,
 * altitude, sun event or clock; groups; the refocus-on-temperature rule.
 */
import { computeNight } from '@/shared/ephemeris/night';
import { altAzOf, hourAngleH, moonAltitudeDeg, moonSeparationDeg, precessToDate, sunAltitudeDeg } from '@/shared/ephemeris/sky';
import { effectiveMinAltitudeDeg } from '@/shared/horizon/profile';
import { checkRecipe } from '@/shared/recipe/checks';
import { bandOfFilter, resolveFilter } from '@/shared/recipe/filters';
import type { NodeOf, RecipeNode, StageNode } from '@/shared/recipe/types';
import { cameraDownloadTimeS } from '@/shared/rig/optics';
import type { FilterSlot } from '@/shared/rig/schema';
import { centreDurationS } from '@/shared/dry-run/models/centre';
import { planCoolDown, temperatureChangeS } from '@/shared/dry-run/models/cooling';
import { ditherS } from '@/shared/dry-run/models/expose';
import { filterChangeS, focusRunS } from '@/shared/dry-run/models/focus';
import { GUIDE_MODEL, guideStartS } from '@/shared/dry-run/models/guide';
import { mountAxes, slewDurationS, type MountPosition, type PierSide } from '@/shared/dry-run/models/slew';
import { zonedWallTimeToUtc, addDaysYmd } from '@/shared/time';
import type { DryRunInput } from '@/shared/dry-run/types';

export interface SteppedEvent {
  nodeId: string | null;
  kind: string;
  startMs: number;
  endMs: number;
  frames?: number;
}

export interface SteppedNight {
  events: SteppedEvent[];
  codes: Set<string>;
}

interface Guard {
  owner: string;
  why: 'window' | 'altitude';
  ok: (ms: number) => boolean;
}
interface Ctx {
  stage: { node: StageNode; ra: number; dec: number; limit: number; flipAfterMin: number | null; refocusAfterFlip: boolean; focus: { points: number; exposureS: number } } | null;
  guards: Guard[];
  tempRule: number | null;
  openEnded: boolean;
}
type End = { owner: string; why: 'window' | 'altitude'; openEnded: boolean } | null;

const RAD = Math.PI / 180;
const NARROW = new Set(['Ha', 'OIII', 'SII']);

/** Plays `input` second by second. */
export function stepNight(input: DryRunInput): SteppedNight {
  return new Stepper(input).run();
}

class Stepper {
  private readonly night;
  private readonly memo = new Map<string, number>();
  private readonly events: SteppedEvent[] = [];
  private readonly codes = new Set<string>();
  private t: number;
  private at: 'park' | { ra: number; dec: number } = 'park';
  private pier: PierSide | null = null;
  private filter: FilterSlot | undefined;
  private sensorC: number;
  private cooled = false;
  private guiding = false;
  private settleS: number;
  private errorArcsec = 300;
  private lastFocus: { ms: number; c: number } | null = null;
  private sinceDither = 0;
  private lights = 0;

  constructor(private readonly input: DryRunInput) {
    this.night = computeNight(input.site, input.nightDate);
    this.t = Date.parse(this.night.sunset!);
    this.sensorC = this.ambient(this.t);
    this.settleS = input.rig.guider.settleTimeS;
  }

  run(): SteppedNight {
    for (const f of checkRecipe(this.input.tree, { rig: this.input.rig, site: this.input.site })) this.codes.add(f.code);
    const nightEnd = Date.parse(this.night.spanEnd);
    this.list(this.input.tree.children, { stage: null, guards: [{ owner: 'night', why: 'window', ok: (ms) => ms <= nightEnd }], tempRule: null, openEnded: false });
    const dawn = Date.parse(this.night.astronomicalDawn!);
    if (this.events.some((e) => !['flats', 'darks', 'park', 'warm', 'wait', 'pause'].includes(e.kind) && e.endMs > dawn)) this.codes.add('past-dawn');
    if (this.at !== 'park') this.codes.add('past-dawn');
    if (this.cooled) this.codes.add('not-cooled');
    if (this.lights > 0 && (this.input.darkLibrary ?? []).length === 0) this.codes.add('darks-missing');
    return { events: this.events, codes: this.codes };
  }

  // ---- the sky, one whole second at a time -------------------------------------------------

  private cached(key: string, ms: number, f: (d: Date) => number): number {
    const s = Math.floor(ms / 1000);
    const k = `${key}|${s}`;
    let v = this.memo.get(k);
    if (v === undefined) this.memo.set(k, (v = f(new Date(s * 1000))));
    return v;
  }
  private alt(ra: number, dec: number, ms: number) {
    return this.cached(`alt${ra}|${dec}`, ms, (d) => altAzOf(ra / 15, dec, this.input.site, d).altitudeDeg);
  }
  private az(ra: number, dec: number, ms: number) {
    return this.cached(`az${ra}|${dec}`, ms, (d) => altAzOf(ra / 15, dec, this.input.site, d).azimuthDeg);
  }
  private ha(ra: number, dec: number, ms: number) {
    return this.cached(`ha${ra}|${dec}`, ms, (d) => hourAngleH(ra / 15, dec, this.input.site.longitudeDeg, d));
  }
  private above(ra: number, dec: number, limit: number, ms: number) {
    return this.alt(ra, dec, ms) >= effectiveMinAltitudeDeg({ points: this.input.site.horizon }, this.az(ra, dec, ms), limit);
  }
  private ambient(ms: number) {
    const a = Date.parse(this.night.darkStart!);
    const b = Date.parse(this.night.darkEnd!);
    const f = Math.min(1, Math.max(0, (ms - a) / (b - a)));
    return this.input.site.duskTempC + f * (this.input.site.dawnTempC - this.input.site.duskTempC);
  }
  private when(text: string): number {
    const field = { sunset: 'sunset', 'civil-dusk': 'civilDusk', 'nautical-dusk': 'nauticalDusk', 'astronomical-dusk': 'astronomicalDusk', 'astronomical-dawn': 'astronomicalDawn', 'nautical-dawn': 'nauticalDawn', 'civil-dawn': 'civilDawn', sunrise: 'sunrise' }[text];
    if (field) return Date.parse((this.night as Record<string, unknown>)[field] as string);
    const [hh, mm] = text.split(':').map(Number) as [number, number];
    return zonedWallTimeToUtc(hh >= 12 ? this.input.nightDate : addDaysYmd(this.input.nightDate, 1), hh, mm, this.input.site.timeZone).getTime();
  }

  // ---- time passing ------------------------------------------------------------------------

  private event(kind: string, nodeId: string | null, seconds: number, frames?: number) {
    if (seconds <= 0) return;
    const startMs = this.t;
    this.t += seconds * 1000;
    this.events.push(frames === undefined ? { nodeId, kind, startMs, endMs: this.t } : { nodeId, kind, startMs, endMs: this.t, frames });
  }
  /** The first guard that fails at some second of [t, t + seconds], or null. */
  private fits(ctx: Ctx, seconds: number): End {
    for (let s = 0; s <= seconds + 1; s += 1) {
      const ms = this.t + Math.min(s, seconds) * 1000;
      const bad = ctx.guards.find((g) => !g.ok(ms));
      if (bad) return { owner: bad.owner, why: bad.why, openEnded: ctx.openEnded };
    }
    return null;
  }
  /** Idles second by second until `untilMs`, or until a guard fails. */
  private waitUntil(ctx: Ctx, untilMs: number, nodeId: string | null, kind = 'wait'): End {
    const start = this.t;
    let ms = start;
    let bad: Guard | undefined;
    while (ms < untilMs && !(bad = ctx.guards.find((g) => !g.ok(Math.min(ms + 1000, untilMs))))) ms = Math.min(ms + 1000, untilMs);
    this.event(kind, nodeId, (ms - start) / 1000);
    return bad ? { owner: bad.owner, why: bad.why, openEnded: ctx.openEnded } : null;
  }

  // ---- the recipe --------------------------------------------------------------------------

  private list(children: RecipeNode[], ctx: Ctx): End {
    for (const node of children) {
      if (!node.enabled) continue;
      let end: End = null;
      if (node.kind === 'stage') end = this.stageNode(node, ctx);
      else if (node.kind === 'repeat') end = this.repeat(node, ctx);
      else if (node.kind === 'group') end = this.list(node.children, ctx);
      else end = this.flipIfDue(ctx) ?? this.step(node, ctx);
      if (end) return end;
    }
    return null;
  }

  private stageNode(node: StageNode, outer: Ctx): End {
    const target = this.input.targets[node.targetId!]!;
    const { raDeg: ra, decDeg: dec } = target;
    const limit = node.window.minAltitudeDeg ?? this.input.site.minAltitudeDeg;
    const tempRule = node.rules.find((r) => r.kind === 'refocus-on-temperature');
    const stage = { node, ra, dec, limit, flipAfterMin: null, refocusAfterFlip: false, focus: { points: 9, exposureS: 5 } };
    if (node.window.notBefore) {
      const e = this.waitUntil(outer, this.when(node.window.notBefore), node.id);
      if (e) return e;
    }
    const endBy = node.window.endBy ? this.when(node.window.endBy) : Infinity;
    const guards: Guard[] = [...outer.guards, { owner: node.id, why: 'window', ok: (ms) => ms <= endBy }, { owner: node.id, why: 'altitude', ok: (ms) => this.above(ra, dec, limit, ms) }];
    let rise = this.t;
    while (!this.above(ra, dec, limit, rise) && rise < Math.min(endBy, Date.parse(this.night.spanEnd))) rise += 1000;
    if (!this.above(ra, dec, limit, rise)) {
      this.codes.add('low-altitude');
      return null;
    }
    const e = this.waitUntil(outer, rise, node.id);
    if (e) return e;
    let usable = this.t;
    while (usable < Date.parse(this.night.darkEnd!) && this.above(ra, dec, limit, usable)) usable += 1000;
    if (usable - this.t < 3_600_000) this.codes.add('low-altitude');
    const ctx: Ctx = { stage, guards, tempRule: tempRule?.kind === 'refocus-on-temperature' ? tempRule.deltaC : outer.tempRule, openEnded: outer.openEnded };
    const end = this.list(node.children, ctx);
    if (end?.owner === node.id && end.why === 'altitude' && !end.openEnded) this.codes.add('low-altitude');
    return end && end.owner !== node.id ? end : null;
  }

  private repeat(node: NodeOf<'repeat'>, outer: Ctx): End {
    const u = node.until;
    const s = outer.stage;
    let ok: ((ms: number) => boolean) | null = null;
    if (u.altitudeBelowDeg !== undefined && s) ok = (ms) => this.alt(s.ra, s.dec, ms) >= u.altitudeBelowDeg!;
    if (u.sunEvent !== undefined || u.clock !== undefined) {
      const end = this.when((u.sunEvent ?? u.clock)!);
      ok = (ms) => ms <= end;
    }
    const ctx: Ctx = { ...outer, guards: ok ? [...outer.guards, { owner: node.id, why: 'window', ok }] : outer.guards, openEnded: outer.openEnded || u.count === undefined };
    for (let i = 0; i < (u.count ?? 20_000); i += 1) {
      if (ok && !ok(this.t)) return null;
      const end = this.list(node.children, ctx);
      if (end) return end.owner === node.id ? null : end;
    }
    return null;
  }

  private position(at: 'park' | { ra: number; dec: number }): MountPosition {
    const site = this.input.site;
    if (at === 'park') {
      const { altDeg, azDeg } = this.input.rig.mount.park;
      const [h, a, p] = [altDeg * RAD, azDeg * RAD, site.latitudeDeg * RAD];
      const dec = Math.asin(Math.sin(p) * Math.sin(h) + Math.cos(p) * Math.cos(h) * Math.cos(a)) / RAD;
      return { haH: 0, decDeg: dec, altDeg, azDeg, park: true };
    }
    const d = new Date(Math.floor(this.t / 1000) * 1000);
    const hor = altAzOf(at.ra / 15, at.dec, site, d);
    return { haH: this.ha(at.ra, at.dec, this.t), decDeg: precessToDate(at.ra / 15, at.dec, d).decDeg, altDeg: hor.altitudeDeg, azDeg: hor.azimuthDeg };
  }

  private slew(to: 'park' | { ra: number; dec: number }, nodeId: string, ctx: Ctx): End {
    const type = this.input.rig.mount.type;
    const pier: PierSide | null = to === 'park' || type !== 'german-equatorial' ? null : this.ha(to.ra, to.dec, this.t) < 0 ? 'west' : 'east';
    const seconds = slewDurationS(mountAxes(type, this.position(this.at), this.pier), mountAxes(type, this.position(to), pier), this.input.rig.mount, to !== 'park');
    const end = this.fits(ctx, seconds);
    if (end) return end;
    if (sunAltitudeDeg(this.input.site, new Date(this.t)) > -4) this.codes.add('sun-near');
    this.at = to;
    this.pier = pier;
    this.guiding = false;
    this.errorArcsec = 300;
    this.sinceDither = 0;
    this.event(to === 'park' ? 'park' : 'slew', nodeId, seconds);
    return null;
  }

  private focus(ctx: Ctx, slot: FilterSlot | undefined, nodeId: string | null, kind = 'focus'): End {
    const params = ctx.stage?.focus ?? { points: 9, exposureS: 5 };
    const seconds = (slot && slot !== this.filter ? filterChangeS(this.filter, slot, this.input.rig.filterWheel.changeTimeS) : 0) + focusRunS(params, this.input.rig);
    const end = this.fits(ctx, seconds);
    if (end) return end;
    if (slot) this.filter = slot;
    this.event(kind, nodeId, seconds);
    this.lastFocus = { ms: this.t, c: this.ambient(this.t) };
    return null;
  }

  /** True when some second of the next ten minutes reaches the flip (rule 2). */
  private flipWithin10(ctx: Ctx): boolean {
    const s = ctx.stage;
    if (!s || s.flipAfterMin === null || this.pier !== 'west') return false;
    for (let k = 0; k < 600; k += 1) if (this.ha(s.ra, s.dec, this.t + k * 1000) * 60 >= s.flipAfterMin) return true;
    return false;
  }

  /** True when the flip is due now, or a frame of `frameS` would run past the mount's limit at some second. */
  private flipDue(ctx: Ctx, frameS: number): boolean {
    const s = ctx.stage;
    if (!s || s.flipAfterMin === null || this.pier !== 'west' || this.at === 'park') return false;
    const limit = this.input.rig.mount.meridian.trackPastMin;
    let due = this.ha(s.ra, s.dec, this.t) * 60 >= s.flipAfterMin;
    for (let k = 0; !due && k <= frameS; k += 1) due = this.ha(s.ra, s.dec, this.t + k * 1000) * 60 > limit;
    return due;
  }

  private flipIfDue(ctx: Ctx, frameS = 0): End {
    if (!this.flipDue(ctx, frameS)) return null;
    const s = ctx.stage!;
    const policyId = (s.node.children.find((c) => c.kind === 'meridian') ?? null)?.id ?? null;
    const type = this.input.rig.mount.type;
    const pos = this.position(this.at);
    const slewS = slewDurationS(mountAxes(type, pos, 'west'), mountAxes(type, pos, 'east'), this.input.rig.mount);
    this.event('flip', policyId, slewS);
    this.pier = 'east';
    this.event('flip', policyId, centreDurationS({ toleranceArcsec: 30, maxAttempts: 3, solveExposureS: 5, errorArcsec: 300 }, this.input.rig).durationS);
    if (this.guiding) this.event('flip', policyId, GUIDE_MODEL.restartS);
    return s.refocusAfterFlip ? this.focus(ctx, this.filter, policyId, 'flip') : null;
  }

  private step(node: RecipeNode, ctx: Ctx): End {
    const rig = this.input.rig;
    const s = ctx.stage;
    const timed = (kind: string, seconds: number): End => this.fits(ctx, seconds) ?? (this.event(kind, node.id, seconds), null);
    switch (node.kind) {
      case 'cool': {
        const plan = planCoolDown(this.sensorC, node.setpointC, this.ambient(this.t), rig.camera.cooling.maxDeltaBelowAmbientC, rig.camera.cooling.rateCPerMin);
        const end = timed('cool', plan.durationS);
        if (!end) [this.sensorC, this.cooled] = [plan.reachedC, true];
        return end;
      }
      case 'warm': {
        const to = this.ambient(this.t);
        const end = timed('warm', temperatureChangeS(this.sensorC, to, rig.camera.cooling.rateCPerMin));
        if (!end) [this.sensorC, this.cooled] = [to, false];
        return end;
      }
      case 'slew':
        return s ? this.slew({ ra: s.ra, dec: s.dec }, node.id, ctx) : null;
      case 'park':
        return this.slew('park', node.id, ctx);
      case 'centre': {
        const end = timed('centre', centreDurationS({ ...node, errorArcsec: this.errorArcsec }, rig).durationS);
        if (!end) this.errorArcsec = 0;
        return end;
      }
      case 'focus':
        if (s) s.focus = { points: node.points, exposureS: node.exposureS };
        return this.focus(ctx, node.filter ? resolveFilter(rig, node.filter) : this.filter, node.id);
      case 'guide': {
        const end = timed('guide', guideStartS(node.calibrate, rig.guider));
        if (!end) [this.guiding, this.settleS] = [true, node.settleTimeS];
        return end;
      }
      case 'meridian':
        if (s && node.policy.kind === 'flip') [s.flipAfterMin, s.refocusAfterFlip] = [node.policy.flipAfterMin, node.policy.refocus];
        return null;
      case 'wait':
        if (node.until.durationS !== undefined) return this.waitUntil(ctx, this.t + node.until.durationS * 1000, node.id);
        return this.waitUntil(ctx, this.when((node.until.sunEvent ?? node.until.clock)!), node.id);
      case 'expose':
        return this.expose(node, ctx);
      default:
        return null;
    }
  }

  private expose(node: NodeOf<'expose'>, ctx: Ctx): End {
    const rig = this.input.rig;
    const slot = resolveFilter(rig, node.filter);
    const narrow = NARROW.has(bandOfFilter(node.filter, rig));
    const frameS = node.exposureS + cameraDownloadTimeS(rig.camera, node.binning);
    let block: SteppedEvent | null = null;
    const close = () => {
      if (block && block.frames) this.events.push(block);
      block = null;
    };
    if (!this.cooled) this.codes.add('not-cooled');
    if (!this.guiding && node.exposureS > 120) this.codes.add('unguided-long');
    for (let i = 0; i < node.count; i += 1) {
      const drifted = this.lastFocus === null || Math.abs(this.ambient(this.t) - this.lastFocus.c) >= (ctx.tempRule ?? Infinity);
      if (ctx.tempRule !== null && drifted && !this.flipWithin10(ctx)) {
        close();
        const end = this.focus(ctx, slot, ctx.stage!.node.id);
        if (end) return end;
      }
      if (ctx.tempRule === null && this.lastFocus && Math.abs(this.ambient(this.t) - this.lastFocus.c) > 1) this.codes.add('focus-drift');
      if (this.flipDue(ctx, frameS)) close();
      const flipped = this.flipIfDue(ctx, frameS);
      if (flipped) return flipped;
      if (block && (block as SteppedEvent).endMs !== this.t) close();
      const change = slot && slot !== this.filter ? filterChangeS(this.filter, slot, rig.filterWheel.changeTimeS) : 0;
      const dither = node.ditherEvery > 0 && this.sinceDither >= node.ditherEvery ? ditherS(this.guiding, this.settleS, rig.mount.settleS) : 0;
      const end = this.fits(ctx, change + dither + frameS);
      if (end) return close(), end;
      if (slot) this.filter = slot;
      if (dither > 0) this.sinceDither = 0;
      block ??= { nodeId: node.id, kind: 'expose', startMs: this.t, endMs: this.t, frames: 0 };
      this.t += (change + dither) * 1000;
      this.watchFrame(node.exposureS, narrow);
      this.t += frameS * 1000;
      block.endMs = this.t;
      block.frames! += 1;
      this.sinceDither += 1;
      this.lights += 1;
    }
    close();
    return null;
  }

  /** Every second of the shutter: the Sun and the Moon. */
  private watchFrame(exposureS: number, narrow: boolean) {
    if (this.at === 'park') return;
    const { ra, dec } = this.at;
    const age = (Math.abs(this.night.moonPhaseDeg - 180) / 360) * 29.530589;
    const need = narrow ? 40 / (1 + (age / 7) ** 2) : 120 / (1 + (age / 14) ** 2);
    for (let s = 0; s <= exposureS; s += 1) {
      const d = new Date(this.t + s * 1000);
      const sun = this.cached('sun', d.getTime(), (x) => sunAltitudeDeg(this.input.site, x));
      if (sun >= (narrow ? -12 : -18)) this.codes.add('daylight');
      const moonUp = this.cached('moon', d.getTime(), (x) => moonAltitudeDeg(this.input.site, x)) > 0;
      if (moonUp && this.cached(`sep${ra}|${dec}`, d.getTime(), (x) => moonSeparationDeg(ra / 15, dec, x, this.input.site)) < need) this.codes.add('moon-near');
    }
  }
}
