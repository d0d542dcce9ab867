import { describe, expect, it } from 'vitest';
import { filterChoices, pickFraming, presetChips, recognizeFraming, sunEventLabel, switchWhenMode, targetChoices, toggleName } from '@/components/recipes/node-editor/choices';
import { defaultRigInput } from '@/shared/rig/schema';

const rig = defaultRigInput();
const framing = { id: 'f1', name: 'Core tilt', raDeg: 10.6847, decDeg: 41.2687, positionAngleDeg: 35 };

describe('node editor choices', () => {
  it('toggles a name in a comma list', () => {
    expect(toggleName('L, R', 'G')).toBe('L, R, G');
    expect(toggleName('L, R, G', 'R')).toBe('L, G');
    expect(toggleName('', 'Ha')).toBe('Ha');
  });

  it('offers the wheel in slot order, keeps a foreign name marked, and a blank choice when asked', () => {
    const names = rig.filterWheel.slots.map((s) => s.name);
    const choices = filterChoices(rig, ['Hb'], 'In the beam');
    expect(choices[0]).toEqual({ value: '', label: 'In the beam' });
    expect(choices.slice(1, -1).map((c) => c.value)).toEqual(names);
    expect(choices.at(-1)).toEqual({ value: 'Hb', label: 'Hb (not in wheel)' });
    expect(filterChoices(undefined, [])).toEqual([]);
  });

  it('turns camera presets into quick picks', () => {
    expect(presetChips(rig, 'gain').every((c) => /^\d+(\.\d+)?$/.test(c.value))).toBe(true);
    expect(presetChips(undefined, 'offset')).toEqual([]);
  });

  it('lists targets after "No target" and keeps an unknown current one', () => {
    const list = targetChoices([{ id: 't1', designation: 'M31', name: 'Andromeda Galaxy' }], 't9');
    expect(list.map((c) => c.label)).toEqual(['No target', 'M31 · Andromeda Galaxy', 'A target not in your list']);
  });

  it('copies a recorded framing into the fields and recognises it again', () => {
    const picked = pickFraming({ 'framing.mode': 'none' }, 'f1', [framing]);
    expect(picked).toMatchObject({ 'framing.mode': 'f1', 'framing.raDeg': '10.6847', 'framing.positionAngleDeg': '35' });
    expect(recognizeFraming({ ...picked, 'framing.mode': 'custom' }, [framing])['framing.mode']).toBe('f1');
    expect(recognizeFraming({ ...picked, 'framing.mode': 'custom', 'framing.positionAngleDeg': '36' }, [framing])['framing.mode']).toBe('custom');
  });

  it('switches a window edge between a sun event and a clock time', () => {
    const sun = switchWhenMode({ 'w.mode': 'none', w: '' }, 'w', 'sun', 'astronomical-dusk');
    expect(sun).toEqual({ 'w.mode': 'sun', w: 'astronomical-dusk' });
    expect(switchWhenMode(sun, 'w', 'clock', 'astronomical-dusk')).toEqual({ 'w.mode': 'clock', w: '' });
    expect(switchWhenMode({ 'w.mode': 'clock', w: '22:00' }, 'w', 'none', 'sunset')).toEqual({ 'w.mode': 'none', w: '22:00' });
    expect(sunEventLabel('astronomical-dawn')).toBe('Astronomical dawn');
  });
});
