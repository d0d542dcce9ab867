import { describe, expect, it } from 'vitest';
import { cameraDownloadTimeS } from '@/shared/rig/optics';
import { defaultRigInput } from '@/shared/rig/schema';
import { darksDurationS, flatsDurationS } from '@/shared/dry-run/models/calibration';
import { centreDurationS, expectedCentreAttempts } from '@/shared/dry-run/models/centre';
import { ambientTempC, planCoolDown, temperatureChangeS } from '@/shared/dry-run/models/cooling';
import { driftArcmin, secondsUntilDrift } from '@/shared/dry-run/models/drift';
import { ditherDue, ditherS, exposeBlockS, frameS } from '@/shared/dry-run/models/expose';
import { flipCostS, msAfterTransit } from '@/shared/dry-run/models/flip';
import { filterChangeS, focusRunS } from '@/shared/dry-run/models/focus';
import { guideStartS } from '@/shared/dry-run/models/guide';
import { daysFromFullMoon, MOON_AVOIDANCE_DEFAULTS, requiredMoonSeparationDeg } from '@/shared/dry-run/models/moon-avoidance';
import { initialRotatorDeg, planRotation, skyPositionAngleDeg } from '@/shared/dry-run/models/rotate';
import { axisDistancesDeg, axisMoveS, correctionSlewS, mountAxes, slewDurationS } from '@/shared/dry-run/models/slew';
import { angleDeg, arcClosestApproachDeg, horizonVector, pathClosestApproachDeg } from '@/shared/dry-run/models/slew-path';

// The default rig carries the trade-defaults.md values: 3.5 °/s, 1 s to full rate, settle 5 s
// (practice; S9), cooling 3 °C/min and 30 °C below ambient (S2, S3), a 26 MP 16-bit camera on USB 3.
const rig = defaultRigInput();
const mount = rig.mount;
/** Download of a 6248 × 4176 16-bit frame on USB 3 (S7): 2 × 26,091,648 B ÷ 250 MB/s + 0.3 s (computed). */
const DL1 = (2 * 6248 * 4176) / 250e6 + 0.3;
const DL2 = (2 * 6248 * 4176) / 4 / 250e6 + 0.3;

describe('download (S7)', () => {
  it('a 26 MP 16-bit frame on USB 3 takes about 0.5 s', () => {
    // trade-defaults.md "download" (S7): a 26 MP 16-bit sensor ≈ 0.5 s on USB 3
    expect(cameraDownloadTimeS(rig.camera, 1)).toBeCloseTo(0.5087, 4);
    expect(frameS(300, 1, rig.camera)).toBeCloseTo(300 + DL1, 6);
    expect(frameS(300, 2, rig.camera)).toBeCloseTo(300 + DL2, 6);
  });
});

describe('cooling (S1, S2, S3)', () => {
  it('10 °C to −10 °C at 3 °C/min takes 6.67 min', () => {
    // trade-defaults.md "cooling": rate 3 °C/min (practice; S3); computed 20 / 3 = 6.67 min
    expect(temperatureChangeS(10, -10, 3)).toBeCloseTo(400, 6);
    expect(temperatureChangeS(10, -10, 3) / 60).toBeCloseTo(6.67, 2);
  });
  it('stops at ambient − largest drop (30 °C, S2) and says the set-point is out of reach', () => {
    expect(planCoolDown(10, -10, 10, 30, 3)).toEqual({ reachedC: -10, durationS: 400, reachable: true });
    // ambient 10 °C − 30 °C = −20 °C floor (computed): −25 °C is out of reach, 30 °C of cooling = 600 s
    expect(planCoolDown(10, -25, 10, 30, 3)).toEqual({ reachedC: -20, durationS: 600, reachable: false });
  });
  it('the ambient curve is linear from dusk to dawn and flat outside (Nightloom simplification)', () => {
    const curve = { duskMs: 0, dawnMs: 10 * 3_600_000, duskTempC: 10, dawnTempC: 4 };
    expect(ambientTempC(curve, -1)).toBe(10);
    expect(ambientTempC(curve, 5 * 3_600_000)).toBeCloseTo(7, 9);
    expect(ambientTempC(curve, 20 * 3_600_000)).toBe(4);
  });
});

describe('slew (trade-defaults.md "slew": practice; S9; acceleration common practice)', () => {
  it('90° at 3.5 °/s with 1 s to full rate + 5 s settle = 31.714 s', () => {
    // computed: 90 / 3.5 + 1 = 26.714 s on the axis, + 5 s settle
    expect(axisMoveS(90, 3.5, 1)).toBeCloseTo(26.7143, 4);
    const from = { axis1Deg: 0, axis2Deg: 40 };
    expect(slewDurationS(from, { axis1Deg: 90, axis2Deg: 40 }, mount)).toBeCloseTo(31.7143, 4);
  });
  it('short moves never reach full rate: 2·√(d·tₐ / v), continuous at d = v·tₐ', () => {
    expect(axisMoveS(1, 3.5, 1)).toBeCloseTo(2 * Math.sqrt(1 / 3.5), 9);
    expect(axisMoveS(3.5, 3.5, 1)).toBeCloseTo(2, 9);
    expect(axisMoveS(3.5 - 1e-9, 3.5, 1)).toBeCloseTo(2, 6);
    expect(axisMoveS(0, 3.5, 1)).toBe(0);
  });
  it('the slower axis wins', () => {
    const slowDec = { ...mount, maxSlewRateDegPerS: { axis1: 3.5, axis2: 1.75 } };
    // axis 1: 60 / 3.5 + 1 = 18.14 s; axis 2: 50 / 1.75 + 1 = 29.57 s (computed)
    expect(slewDurationS({ axis1Deg: 0, axis2Deg: 0 }, { axis1Deg: 60, axis2Deg: 50 }, slowDec)).toBeCloseTo(29.5714 + 5, 4);
  });
  it('a German mount flip turns axis 1 by 180° and axis 2 from δ to 180° − δ', () => {
    const pos = { haH: 0.1, decDeg: 40, altDeg: 80, azDeg: 190 };
    const west = mountAxes('german-equatorial', pos, 'west');
    const east = mountAxes('german-equatorial', pos, 'east');
    expect(axisDistancesDeg('german-equatorial', west, east)).toEqual([180, 100]);
    // computed: 180 / 3.5 + 1 + 5 = 57.43 s
    expect(slewDurationS(west, east, mount)).toBeCloseTo(57.4286, 4);
  });
  it('alt-az and fork mounts take the short way round; no settle for a park', () => {
    expect(axisDistancesDeg('alt-az', { axis1Deg: 350, axis2Deg: 20 }, { axis1Deg: 10, axis2Deg: 30 })).toEqual([20, 10]);
    expect(axisDistancesDeg('fork', { axis1Deg: -170, axis2Deg: 0 }, { axis1Deg: 170, axis2Deg: 0 })).toEqual([20, 0]);
    expect(slewDurationS({ axis1Deg: 0, axis2Deg: 0 }, { axis1Deg: 90, axis2Deg: 0 }, mount, false)).toBeCloseTo(26.7143, 4);
  });
  it('a 5′ correction nudge: triangle profile + settle', () => {
    // computed: 2·√(0.08333 / 3.5) = 0.3086 s + 5 s
    expect(correctionSlewS(300, mount)).toBeCloseTo(5.3086, 4);
  });
});

describe('sun on the slew path (S31: 30°)', () => {
  it('finds the closest approach of a great-circle arc exactly, as dense sampling would', () => {
    const a = horizonVector(30, 60);
    const b = horizonVector(50, 250);
    const sun = horizonVector(70, 120);
    let sampled = Infinity;
    for (let i = 0; i <= 20_000; i += 1) {
      const f = i / 20_000;
      const omega = Math.acos(a[0] * b[0] + a[1] * b[1] + a[2] * b[2]);
      const wa = Math.sin((1 - f) * omega) / Math.sin(omega);
      const wb = Math.sin(f * omega) / Math.sin(omega);
      sampled = Math.min(sampled, angleDeg([wa * a[0] + wb * b[0], wa * a[1] + wb * b[1], wa * a[2] + wb * b[2]], sun));
    }
    expect(arcClosestApproachDeg(a, b, sun)).toBeCloseTo(sampled, 3);
    expect(pathClosestApproachDeg([a], sun)).toBeCloseTo(angleDeg(a, sun), 9);
  });
  it('uses the nearer end when the perpendicular falls outside the arc', () => {
    const a = horizonVector(0, 0);
    const b = horizonVector(0, 30);
    expect(arcClosestApproachDeg(a, b, horizonVector(0, 90))).toBeCloseTo(60, 9);
  });
});

describe('centre (practice: 30″, 3 attempts, plan on 2 rounds; solve 5 s, common practice)', () => {
  it('expects 2 rounds for a 5′ error at 30″, more for tighter tolerances, capped at the attempts', () => {
    expect(expectedCentreAttempts(300, 30, 3)).toBe(2);
    // computed: 1 + ⌈log(10/300) / log(0.1)⌉ = 1 + ⌈1.48⌉ = 3
    expect(expectedCentreAttempts(300, 10, 5)).toBe(3);
    expect(expectedCentreAttempts(20, 30, 3)).toBe(1);
    expect(expectedCentreAttempts(3000, 1, 3)).toBe(3);
  });
  it('each round: 5 s solve exposure + bin-2 download + 5 s solve + the correction slew', () => {
    const { attempts, durationS } = centreDurationS({ toleranceArcsec: 30, maxAttempts: 3, solveExposureS: 5, errorArcsec: 300 }, rig);
    // computed: 2 × (5 + 0.3522 + 5) + (5.3086 + 5.0976) = 31.11 s
    expect(attempts).toBe(2);
    expect(durationS).toBeCloseTo(2 * (10 + DL2) + correctionSlewS(300, mount) + correctionSlewS(30, mount), 9);
    expect(durationS).toBeCloseTo(31.11, 2);
  });
});

describe('rotate (rule 12)', () => {
  const rotator = { minDeg: 0, maxDeg: 360, speedDegPerS: 5, skyOffsetDeg: 0 };
  it('turns to the nearest equivalent angle within travel at the rotator speed', () => {
    // computed: 90° / 5 °/s = 18 s
    expect(planRotation(0, 90, 'west', rotator)).toEqual({ mechanicalDeg: 90, moveDeg: 90, durationS: 18, reachable: true });
    // travel 0–360°: crossing 360° would wind the cables past the limit, so 350° → 10° goes the long way back
    expect(planRotation(350, 10, 'west', rotator)).toMatchObject({ mechanicalDeg: 10, moveDeg: 340 });
    expect(planRotation(170, 190, 'west', { ...rotator, minDeg: -180, maxDeg: 180 })).toMatchObject({ mechanicalDeg: -170, moveDeg: 340 });
    expect(planRotation(100, 190, 'west', { ...rotator, minDeg: 0, maxDeg: 200 })).toMatchObject({ mechanicalDeg: 190, moveDeg: 90 });
  });
  it('never winds past the travel: east of the pier PA 90° needs 270° mechanical from 0°', () => {
    expect(planRotation(0, 90, 'east', rotator)).toMatchObject({ mechanicalDeg: 270, durationS: 54 });
  });
  it('is unreachable when no equivalent lies within travel; skips moves within tolerance', () => {
    expect(planRotation(0, 270, 'west', { ...rotator, maxDeg: 180 }).reachable).toBe(false);
    expect(planRotation(90, 90.02, 'west', rotator, 0.05).durationS).toBe(0);
  });
  it('sky PA = mechanical + offset, +180° east of the pier (checks.md "After a meridian flip")', () => {
    expect(skyPositionAngleDeg(10, 5, 'west')).toBe(15);
    expect(skyPositionAngleDeg(10, 5, 'east')).toBe(195);
    expect(initialRotatorDeg({ minDeg: 20, maxDeg: 300 })).toBe(20);
  });
});

describe('focus (practice: 9 points × 5 s, ~3 min, 2–5 min; moves common practice)', () => {
  it('9 points: 9 × (5 + 0.51 + 5 + 3) + 5 = 126.6 s, inside 2–5 min', () => {
    const s = focusRunS({ points: 9, exposureS: 5 }, rig);
    expect(s).toBeCloseTo(9 * (5 + DL1 + 8) + 5, 9);
    expect(s / 60).toBeGreaterThan(2);
    expect(s / 60).toBeLessThan(5);
    expect(focusRunS({ points: 9, exposureS: 5 }, { ...rig, focuser: { ...rig.focuser, backlashSteps: 40 } })).toBeCloseTo(s + 5, 9);
  });
  it('a filter change costs the wheel time, plus a focuser move when the offsets differ (S15)', () => {
    const [l, r] = [{ name: 'L', band: 'L' as const, focusOffsetSteps: 0 }, { name: 'R', band: 'R' as const, focusOffsetSteps: 40 }];
    expect(filterChangeS(l, l, 3)).toBe(0);
    expect(filterChangeS(l, { ...r, focusOffsetSteps: 0 }, 3)).toBe(3);
    expect(filterChangeS(l, r, 3)).toBe(8);
    expect(filterChangeS(undefined, r, 3)).toBe(3);
  });
});

describe('expose and dither (S13, S4; dither move common practice)', () => {
  it('dither = 2 s + 10 s guider settle, or + the mount settle unguided', () => {
    expect(ditherS(true, 10, 5)).toBe(12);
    expect(ditherS(false, 10, 5)).toBe(7);
    expect(ditherDue(2, 2)).toBe(true);
    expect(ditherDue(1, 2)).toBe(false);
    expect(ditherDue(9, 0)).toBe(false);
  });
  it('10 × 120 s, dither every 2, one filter change: 10 × 120.51 + 4 × 12 + 3 = 1256.09 s', () => {
    expect(exposeBlockS(10, 120, DL1, 2, 12, 3)).toBeCloseTo(10 * (120 + DL1) + 48 + 3, 9);
  });
});

describe('guide and flip (S10, S11; trade-defaults.md "flip cost" 3–12 min)', () => {
  it('start with calibration 2 min, restart 40 s', () => {
    expect(guideStartS(true, rig.guider)).toBe(120);
    expect(guideStartS(false, rig.guider)).toBe(40);
  });
  it('a flip with refocus costs about 4.3 min with the defaults, inside 3–12 min', () => {
    const pos = { haH: 0.09, decDeg: 40, altDeg: 80, azDeg: 190 };
    const slewS = slewDurationS(mountAxes('german-equatorial', pos, 'west'), mountAxes('german-equatorial', pos, 'east'), mount);
    const centreS = centreDurationS({ toleranceArcsec: 30, maxAttempts: 3, solveExposureS: 5, errorArcsec: 300 }, rig).durationS;
    const total = flipCostS({ slewS, centreS, rotateS: 0, guideS: 40, focusS: focusRunS({ points: 9, exposureS: 5 }, rig) });
    expect(total / 60).toBeCloseTo(4.26, 1);
    expect(total / 60).toBeGreaterThan(3);
    expect(total / 60).toBeLessThan(12);
  });
  it('hour angle minutes run at the sidereal rate (Meeus ch. 12: 1.0027379)', () => {
    expect(msAfterTransit(5)).toBeCloseTo(300_000 / 1.00273790935, 6);
  });
});

describe('calibration (S21, S44)', () => {
  it('panel flats: 3 filters × (30 × (1 s + 0.51 s) + 3 s change) = 144.8 s', () => {
    expect(flatsDurationS('panel', 3, 30, rig).durationS).toBeCloseTo(3 * (30 * (1 + DL1) + 3), 9);
    expect(flatsDurationS('sky', 1, 10, rig)).toMatchObject({ exposureS: 3 });
  });
  it('darks: 30 × (300 + 0.51) + 30 × (60 + 0.51) s', () => {
    expect(darksDurationS([300, 60], 30, 1, rig.camera)).toBeCloseTo(30 * (300 + DL1) + 30 * (60 + DL1), 9);
  });
});

describe('moon avoidance (S40 formula; values common practice)', () => {
  it('D / (1 + (age/W)²): broadband 120° at full, 96° a week away; narrowband 20° a week away', () => {
    expect(requiredMoonSeparationDeg(0, MOON_AVOIDANCE_DEFAULTS.broadband)).toBe(120);
    expect(requiredMoonSeparationDeg(7, MOON_AVOIDANCE_DEFAULTS.broadband)).toBeCloseTo(96, 9);
    expect(requiredMoonSeparationDeg(7, MOON_AVOIDANCE_DEFAULTS.narrowband)).toBeCloseTo(20, 9);
    // the published form, D 15°, W 6 d (S40): 3 days from full → 12°
    expect(requiredMoonSeparationDeg(3, { separationDeg: 15, widthDays: 6 })).toBeCloseTo(12, 9);
  });
  it('age from full Moon from the ecliptic phase angle', () => {
    expect(daysFromFullMoon(180)).toBe(0);
    expect(daysFromFullMoon(0)).toBeCloseTo(14.765, 3);
    expect(daysFromFullMoon(90)).toBeCloseTo(7.383, 3);
  });
});

describe('drift (common practice: 1′/h guided, 5′/h unguided)', () => {
  it('accumulates at a constant rate', () => {
    expect(driftArcmin(3600, true)).toBe(1);
    expect(driftArcmin(720, false)).toBe(1);
    expect(secondsUntilDrift(2, 0.5, true)).toBe(5400);
  });
});
