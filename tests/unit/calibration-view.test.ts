import { describe, expect, it } from 'vitest';
import { cameraSettingsText, celsiusText, degreesText, importedAtText, nightsText, objectsText, readingText, recordedText, sortDarkSets, validityChoices } from '@/components/calibration/calibration-format';
import { darkStatus, darksToShoot } from '@/components/dry-run/darks-rows';
import { byFilterText, cumulativeSeries, flippedAngle, hoursAxis, integrationText } from '@/components/history/history-format';
import type { DarksNeeded } from '@/shared/dry-run/types';
import type { DarkLibrarySet } from '@/shared/schemas/calibration-api';

describe('calibration words', () => {
  it('says what an import recorded, by type, in the product order', () => {
    expect(recordedText({ light: 12, dark: 3, flat: 4, bias: 0 })).toBe('12 lights, 3 darks and 4 flats');
    expect(recordedText({ light: 0, dark: 1, flat: 0, bias: 0 })).toBe('1 dark');
    expect(recordedText({ light: 1, dark: 0, flat: 0, bias: 2 })).toBe('1 light and 2 bias frames');
    expect(recordedText({ light: 0, dark: 0, flat: 0, bias: 0 })).toBeNull();
    expect(readingText(120, 400)).toBe('Reading headers 120 / 400');
  });

  it('describes a past import: when, its nights and up to three objects', () => {
    expect(importedAtText('2026-11-17T20:04:30Z', 'Europe/Zurich')).toBe('17 Nov 2026, 21:04');
    expect(nightsText('2026-10-08', '2026-10-08')).toBe('Thu 8 Oct 2026');
    expect(nightsText('2026-10-08', '2026-10-09')).toBe('Thu 8 Oct 2026 – Fri 9 Oct 2026');
    expect(objectsText({ objects: [], objectCount: 0 })).toBeNull();
    expect(objectsText({ objects: ['M 31'], objectCount: 1 })).toBe('M 31');
    expect(objectsText({ objects: ['M 31', 'M 33', 'NGC 891'], objectCount: 3 })).toBe('M 31, M 33 and NGC 891');
    expect(objectsText({ objects: ['IC 1396', 'M 31', 'M 33'], objectCount: 5 })).toBe('IC 1396, M 31, M 33 and 2 more');
  });

  it('writes angles with one decimal in 0…360 and temperatures with a true minus', () => {
    expect(degreesText(125)).toBe('125.0°');
    expect(degreesText(305.04)).toBe('305.0°');
    expect(degreesText(-0.02)).toBe('0.0°');
    expect(degreesText(359.96)).toBe('0.0°');
    expect(celsiusText(-10)).toBe('−10 °C');
    expect(celsiusText(0.5)).toBe('0.5 °C');
  });

  it('names unset camera settings "as set" and lists the readout mode when there is one', () => {
    expect(cameraSettingsText({ gain: 100, offset: 50, binning: 1 })).toBe('gain 100 · offset 50 · bin 1');
    expect(cameraSettingsText({ gain: null, offset: null, binning: 2, readoutMode: 'High gain' })).toBe('gain as set · offset as set · bin 2 · High gain');
  });

  it('offers validity from 1 to 12 months, 6 marked as common practice (trade-defaults.md, S22)', () => {
    const choices = validityChoices();
    expect(choices).toHaveLength(12);
    expect(choices[0]).toEqual({ value: '1', label: '1 month' });
    expect(choices[5]).toEqual({ value: '6', label: '6 months (common practice)' });
  });

  it('orders the library by temperature, exposure and settings, newest first', () => {
    const set = (over: Partial<DarkLibrarySet>): DarkLibrarySet => ({ id: 'x', source: 'hand', version: 1, exposureS: 300, gain: 100, offset: 50, binning: 1, readoutMode: null, temperatureC: -10, frames: 30, takenOn: '2025-01-01', stale: false, notes: '', ...over });
    const sorted = sortDarkSets([
      set({ id: 'warm', temperatureC: 0 }),
      set({ id: 'long-old', exposureS: 600, takenOn: '2024-01-01' }),
      set({ id: 'long-new', exposureS: 600, takenOn: '2025-06-01' }),
      set({ id: 'short', exposureS: 120 }),
    ]);
    expect(sorted.map((s) => s.id)).toEqual(['short', 'long-new', 'long-old', 'warm']);
  });
});

describe('dry-run darks', () => {
  const need = (over: Partial<DarksNeeded>): DarksNeeded => ({ exposureS: 300, gain: 100, offset: 50, binning: 1, readoutMode: null, temperatureC: -10, lightFrames: 20, covered: true, fresh: true, nodeIds: ['n'], ...over });

  it('reads the status from covered and fresh', () => {
    expect(darkStatus({ covered: true, fresh: true })).toBe('fresh');
    expect(darkStatus({ covered: true, fresh: false })).toBe('stale');
    expect(darkStatus({ covered: false, fresh: false })).toBe('missing');
  });

  it('asks for the missing and stale sets only, once each', () => {
    const shoot = darksToShoot([
      need({ exposureS: 300 }),
      need({ exposureS: 120, covered: false, fresh: false }),
      need({ exposureS: 120, covered: false, fresh: false, readoutMode: 'Low noise' }),
      need({ exposureS: 600, fresh: false }),
    ]);
    expect(shoot).toEqual([
      { exposureS: 120, gain: 100, offset: 50, binning: 1, temperatureC: -10 },
      { exposureS: 600, gain: 100, offset: 50, binning: 1, temperatureC: -10 },
    ]);
  });
});

describe('capture history series', () => {
  const nights = [
    { nightDate: '2025-10-13', byFilter: [{ filter: 'Ha', frames: 10, seconds: 3000 }, { filter: 'OIII', frames: 4, seconds: 1200 }] },
    { nightDate: '2025-10-12', byFilter: [{ filter: 'Ha', frames: 6, seconds: 1800 }] },
    { nightDate: '2025-10-20', byFilter: [{ filter: 'OIII', frames: 13, seconds: 3900 }] },
  ];

  it('adds up each filter night by night, from its first night on, most integration first', () => {
    const series = cumulativeSeries(nights);
    expect(series.map((s) => s.filter)).toEqual(['OIII', 'Ha']);
    expect(series[0]!.points.map((p) => [p.nightDate, p.seconds])).toEqual([
      ['2025-10-13', 1200],
      ['2025-10-20', 5100],
    ]);
    expect(series[1]!.points.map((p) => [p.nightDate, p.seconds])).toEqual([
      ['2025-10-12', 1800],
      ['2025-10-13', 4800],
      ['2025-10-20', 4800],
    ]);
    expect(series[1]!.points[0]!.ms).toBe(Date.UTC(2025, 9, 12, 12));
  });

  it('picks a round hours axis with at most four steps', () => {
    expect(hoursAxis(4800)).toEqual({ maxHours: 1.5, stepHours: 0.5 });
    expect(hoursAxis(0)).toEqual({ maxHours: 0.5, stepHours: 0.25 });
    expect(hoursAxis(9 * 3600)).toEqual({ maxHours: 10, stepHours: 5 });
    expect(hoursAxis(31 * 3600)).toEqual({ maxHours: 40, stepHours: 10 });
  });

  it('writes integration per filter as h:mm, most first, and totals in hours and minutes', () => {
    expect(byFilterText([{ filter: null, frames: 2, seconds: 600 }, { filter: 'Ha', frames: 10, seconds: 3000 }])).toBe('Ha 0:50 · No filter 0:10');
    expect(integrationText(4800)).toBe('1 h 20 min');
    expect(integrationText(0)).toBe('0 min');
  });

  it('turns an angle by 180° across 0°', () => {
    expect(flippedAngle(125)).toBe(305);
    expect(flippedAngle(305)).toBe(125);
    expect(flippedAngle(180)).toBe(0);
  });
});
