import { refraction } from 'astronomia';
import { describe, expect, it } from 'vitest';
import {
  airmassKastenYoung,
  airmassPickering,
  refractionBennettArcmin,
  refractionSaemundssonArcmin,
} from '@/shared/ephemeris/atmosphere';
import { altAzOf } from '@/shared/ephemeris/sky';

const RAD = Math.PI / 180;

describe('airmass', () => {
  it('Kasten & Young 1989 at 60°, 30°, 10°', () => {
    // checks.md "Definitions", Kasten & Young 1989 (Appl. Opt. 28, 4735), computed: 1.1540 / 1.9943 / 5.586
    expect(airmassKastenYoung(60)).toBeCloseTo(1.154, 4);
    expect(airmassKastenYoung(30)).toBeCloseTo(1.9943, 4);
    expect(airmassKastenYoung(10)).toBeCloseTo(5.586, 3);
  });

  it('Pickering 2002 at 60°, 30°, 10°', () => {
    // checks.md "Definitions", Pickering 2002 (DIO 12), computed: 1.1541 / 1.9932 / 5.581
    expect(airmassPickering(60)).toBeCloseTo(1.1541, 4);
    expect(airmassPickering(30)).toBeCloseTo(1.9932, 4);
    expect(airmassPickering(10)).toBeCloseTo(5.581, 3);
  });

  it('is 1 at the zenith, finite at the horizon and Infinity below it', () => {
    expect(airmassKastenYoung(90)).toBeCloseTo(1, 3);
    expect(airmassPickering(90)).toBeCloseTo(1, 3);
    expect(airmassKastenYoung(0)).toBeGreaterThan(35);
    expect(airmassKastenYoung(0)).toBeLessThan(40);
    expect(airmassPickering(0)).toBeGreaterThan(35);
    expect(airmassPickering(0)).toBeLessThan(40);
    expect(airmassKastenYoung(-0.5)).toBe(Infinity);
    expect(airmassPickering(-0.5)).toBe(Infinity);
  });
});

describe('refraction', () => {
  it('Bennett 1982 for apparent altitude at 0° and 45°', () => {
    // checks.md "Definitions", Meeus ch. 16 (Bennett 1982), computed: 34.478′ at 0°, 0.995′ at 45°
    expect(Math.abs(refractionBennettArcmin(0) - 34.478)).toBeLessThan(0.001);
    expect(Math.abs(refractionBennettArcmin(45) - 0.995)).toBeLessThan(0.001);
  });

  it('Saemundsson 1986 for true altitude at 0° and 45°', () => {
    // checks.md "Definitions", Meeus ch. 16 (Saemundsson 1986), computed: 28.982′ at 0°, 1.013′ at 45°
    expect(Math.abs(refractionSaemundssonArcmin(0) - 28.982)).toBeLessThan(0.001);
    expect(Math.abs(refractionSaemundssonArcmin(45) - 1.013)).toBeLessThan(0.001);
  });

  it('agrees with astronomia (independent implementation) from the horizon to the zenith', () => {
    for (const h of [0, 1, 5, 15, 30, 60, 89]) {
      // astronomia refraction.bennett / saemundsson take and return radians
      expect(refractionBennettArcmin(h)).toBeCloseTo((refraction.bennett(h * RAD) / RAD) * 60, 9);
      expect(refractionSaemundssonArcmin(h)).toBeCloseTo((refraction.saemundsson(h * RAD) / RAD) * 60, 9);
    }
  });

  it('is never negative and stays finite below the horizon', () => {
    expect(refractionBennettArcmin(90)).toBe(0);
    expect(refractionSaemundssonArcmin(90)).toBeGreaterThanOrEqual(0);
    expect(Number.isFinite(refractionBennettArcmin(-4.4))).toBe(true);
    expect(Number.isFinite(refractionSaemundssonArcmin(-5.11))).toBe(true);
  });

  it('is the correction altAzOf applies with refraction on (Saemundsson, for the true altitude)', () => {
    const site = { latitudeDeg: 47.3, longitudeDeg: 8.5, elevationM: 400 };
    const date = new Date('2026-12-01T22:00:00Z');
    for (const [raH, decDeg] of [
      [0.712306, 41.269167], // M31
      [5.588139, -5.391111], // M42
      [13.42, 28.38], // M3, low in the east
    ] as const) {
      const geometric = altAzOf(raH, decDeg, site, date, { refraction: false });
      const apparent = altAzOf(raH, decDeg, site, date, { refraction: true });
      if (geometric.altitudeDeg < -1) continue;
      const expectedArcmin = refractionSaemundssonArcmin(geometric.altitudeDeg);
      expect(Math.abs((apparent.altitudeDeg - geometric.altitudeDeg) * 60 - expectedArcmin)).toBeLessThan(0.001);
      expect(apparent.azimuthDeg).toBeCloseTo(geometric.azimuthDeg, 9);
    }
  });
});
