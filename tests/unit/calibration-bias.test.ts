import { describe, expect, it } from 'vitest';
import { biasSetText } from '@/components/calibration/calibration-format';
import { biasServes, groupBiasFrames } from '@/shared/calibration/bias';
import { flatCombos } from '@/shared/calibration/flats';
import type { StoredFrame } from '@/shared/calibration/types';
import { frameRecord, storedFrame } from './calibration-fixtures';

const bias = (dateObs: string, over: Partial<Parameters<typeof storedFrame>[0]> = {}) =>
  storedFrame({ type: 'Bias Frame', dateObs, exposureS: 0.001, gain: 100, offset: 50, binning: 1, readoutMode: 'High Gain', setTempC: -10, sensorTempC: -10.2, ...over });

describe('groupBiasFrames', () => {
  // Nights in Europe/Berlin: 2026-03-14 evening to 2026-03-15 noon is the night of 2026-03-14.
  const frames = [
    bias('2026-03-14T22:00:00'),
    bias('2026-03-14T22:01:00'),
    bias('2026-03-15T01:00:00'),
    // no SET-TEMP: the sensor's −9.6 °C rounds to −10 °C and joins the set
    bias('2026-03-15T01:01:00', { setTempC: undefined, sensorTempC: -9.6 }),
    bias('2026-03-15T01:02:00', { setTempC: -20, sensorTempC: -20.1 }),
    // no temperature at all: a set of its own with a null temperature
    bias('2026-03-15T01:03:00', { setTempC: undefined, sensorTempC: undefined }),
    bias('2026-03-15T01:04:00', { setTempC: undefined, sensorTempC: undefined }),
    bias('2026-03-15T01:05:00', { gain: 0 }),
    bias('2026-03-15T01:06:00', { offset: 10 }),
    bias('2026-03-15T01:07:00', { binning: 2 }),
    bias('2026-03-15T01:08:00', { readoutMode: 'Low Noise' }),
    bias('2026-04-02T21:00:00'),
    storedFrame({ type: 'Dark Frame', dateObs: '2026-03-14T22:00:00', exposureS: 300, gain: 100, offset: 50, setTempC: -10 }),
    storedFrame({ type: 'Light Frame', dateObs: '2026-03-14T22:00:00', exposureS: 300, gain: 100, offset: 50, setTempC: -10 }),
  ];
  // on 2026-09-20 the 6-month cutoff is 2026-03-20: the March sets are stale, the April one is not
  const sets = groupBiasFrames(frames, 6, '2026-09-20');

  it('makes one set per gain, offset, binning, readout mode, temperature (1 °C, or none) and night; bias frames only', () => {
    expect(sets.map((s) => [s.temperatureC, s.gain, s.offset, s.binning, s.readoutMode, s.takenOn, s.frames])).toEqual([
      [-20, 100, 50, 1, 'High Gain', '2026-03-14', 1],
      [-10, 0, 50, 1, 'High Gain', '2026-03-14', 1],
      [-10, 100, 10, 1, 'High Gain', '2026-03-14', 1],
      [-10, 100, 50, 1, 'High Gain', '2026-04-02', 1],
      [-10, 100, 50, 1, 'High Gain', '2026-03-14', 4],
      [-10, 100, 50, 1, 'Low Noise', '2026-03-14', 1],
      [-10, 100, 50, 2, 'High Gain', '2026-03-14', 1],
      [null, 100, 50, 1, 'High Gain', '2026-03-14', 2],
    ]);
    expect(sets.reduce((n, s) => n + s.frames, 0)).toBe(12);
    expect(sets.every((s) => s.source === 'intake')).toBe(true);
  });

  it('gives each set a stable, readable id; a set without a temperature says so', () => {
    expect(sets.find((s) => s.frames === 4)!.id).toBe('bias:2026-03-14|g100|o50|b1|-10C|High%20Gain');
    expect(sets.find((s) => s.temperatureC === null)!.id).toBe('bias:2026-03-14|g100|o50|b1|-C|High%20Gain');
    expect(new Set(sets.map((s) => s.id)).size).toBe(sets.length);
    expect(groupBiasFrames([...frames].reverse(), 6, '2026-09-20').map((s) => s.id)).toEqual(sets.map((s) => s.id));
  });

  it('stales sets by the dark validity: 6 months by default, longer when chosen; exactly at the cutoff is fresh', () => {
    expect(sets.filter((s) => !s.stale).map((s) => s.takenOn)).toEqual(['2026-04-02']);
    expect(groupBiasFrames(frames, 12, '2026-09-20').every((s) => !s.stale)).toBe(true);
    const onCutoff = groupBiasFrames([frameRecord({ frameType: 'bias', exposureS: 0, nightDate: '2026-03-20' })], 6, '2026-09-20');
    expect(onCutoff[0]!.stale).toBe(false);
    expect(groupBiasFrames([frameRecord({ frameType: 'bias', exposureS: 0, nightDate: '2026-03-19' })], 6, '2026-09-20')[0]!.stale).toBe(true);
  });

  it('returns nothing without bias frames', () => {
    expect(groupBiasFrames([], 6, '2026-09-20')).toEqual([]);
    expect(groupBiasFrames([frameRecord({ frameType: 'dark', setTempC: -10 })], 6, '2026-09-20')).toEqual([]);
  });
});

describe('biasServes and flatCombos: bias on record at the lights’ gain, offset and binning', () => {
  const NIGHT = '2026-01-15';
  const today = '2026-02-01';
  const fresh = groupBiasFrames([frameRecord({ frameType: 'bias', exposureS: 0, gain: 100, offset: 50, binning: 1, nightDate: '2026-01-10' })], 6, today);
  const stale = groupBiasFrames([frameRecord({ frameType: 'bias', exposureS: 0, gain: 100, offset: 50, binning: 1, nightDate: '2025-06-01' })], 6, today);

  it('matches gain, offset and binning; a light without a gain or offset takes any set’s; a stale set does not count', () => {
    expect(biasServes(fresh, { gain: 100, offset: 50, binning: 1 })).toBe(true);
    expect(biasServes(fresh, { gain: 0, offset: 50, binning: 1 })).toBe(false);
    expect(biasServes(fresh, { gain: 100, offset: 10, binning: 1 })).toBe(false);
    expect(biasServes(fresh, { gain: 100, offset: 50, binning: 2 })).toBe(false);
    expect(biasServes(fresh, { gain: null, offset: null, binning: 1 })).toBe(true);
    expect(biasServes(stale, { gain: 100, offset: 50, binning: 1 })).toBe(false);
    expect(biasServes([], { gain: null, offset: null, binning: 1 })).toBe(false);
  });

  it('marks each combination: true only when every light of it has matching fresh bias', () => {
    const light = (filter: string, over: Partial<StoredFrame> = {}) => frameRecord({ frameType: 'light', filter, gain: 100, offset: 50, binning: 1, nightDate: NIGHT, ...over });
    const lights = [light('Ha'), light('Ha'), light('L'), light('L', { gain: 0 }), light('R', { binning: 2 })];
    const marks = (sets: typeof fresh) => flatCombos(lights, [], NIGHT, sets).map((c) => [c.filter, c.biasOnRecord]);
    expect(marks(fresh)).toEqual([
      ['Ha', true],
      ['L', false],
      ['R', false],
    ]);
    expect(marks(stale)).toEqual([
      ['Ha', false],
      ['L', false],
      ['R', false],
    ]);
    expect(flatCombos(lights, [], NIGHT).every((c) => !c.biasOnRecord)).toBe(true);
  });
});

describe('biasSetText', () => {
  it('reads like a dark set row: settings, temperature (or none), frames and night', () => {
    const [set] = groupBiasFrames([frameRecord({ frameType: 'bias', exposureS: 0, gain: 100, offset: 50, binning: 1, setTempC: -10, nightDate: '2026-03-14' })], 6, '2026-04-01');
    expect(biasSetText({ ...set!, frames: 50 })).toBe('Bias · gain 100 · offset 50 · bin 1 · −10 °C · 50 frames · Sat 14 Mar 2026');
    expect(biasSetText({ ...set!, temperatureC: null, frames: 1, readoutMode: 'High Gain' })).toBe('Bias · gain 100 · offset 50 · bin 1 · High Gain · no temperature recorded · 1 frame · Sat 14 Mar 2026');
  });
});
