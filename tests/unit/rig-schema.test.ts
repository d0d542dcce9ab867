import { describe, expect, it } from 'vitest';
import { defaultRigInput, rigInputSchema, rigSchema, type RigInputRaw } from '@/shared/rig/schema';
import { unusualRigValues } from '@/shared/rig/typical-ranges';

function issues(input: unknown): { path: string; message: string }[] {
  const r = rigInputSchema.safeParse(input);
  if (r.success) return [];
  return r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

describe('rigInputSchema defaults (trade-defaults.md)', () => {
  const rig = defaultRigInput();

  it('a complete default rig that parses to itself and survives JSON', () => {
    expect(rigInputSchema.parse(rig)).toEqual(rig);
    expect(rigInputSchema.parse(JSON.parse(JSON.stringify(rig)))).toEqual(rig);
    expect(rigInputSchema.parse({})).toEqual(rig);
  });

  it('cooling: largest drop 30 °C (S2), rate 3 °C/min (practice; S3)', () => {
    expect(rig.camera.cooling).toEqual({ maxDeltaBelowAmbientC: 30, rateCPerMin: 3 });
  });

  it('slew: 3.5 °/s, 1 s to full rate (practice), settle 5 s (practice; S9)', () => {
    expect(rig.mount.maxSlewRateDegPerS).toEqual({ axis1: 3.5, axis2: 3.5 });
    expect(rig.mount.accelerationS).toBe(1);
    expect(rig.mount.settleS).toBe(5);
  });

  it('meridian: flip 5 min past (practice; S39)', () => {
    expect(rig.mount.meridian.flipDelayS).toBe(300);
  });

  it('guiding: settle 1.5 px / 10 s / 60 s timeout (practice; S4), start 2 min (S10, S11)', () => {
    expect(rig.guider).toMatchObject({ settlePx: 1.5, settleTimeS: 10, settleTimeoutS: 60, startS: 120 });
  });

  it('returns a fresh copy each call', () => {
    const a = defaultRigInput();
    a.filterWheel.slots[0]!.name = 'Changed';
    a.camera.gainPresets.push({ name: 'x', value: 7 });
    expect(defaultRigInput().filterWheel.slots[0]!.name).toBe('L');
    expect(defaultRigInput().camera.gainPresets).toHaveLength(2);
  });

  it('fills a partial document from the defaults', () => {
    const partial: RigInputRaw = { name: 'Field rig', optics: { focalLengthMm: 400 }, camera: { link: { measuredDownloadS: 1.2 } } };
    const rig2 = rigInputSchema.parse(partial);
    expect(rig2.optics).toEqual({ focalLengthMm: 400, apertureMm: 106, reducerFactor: 1 });
    expect(rig2.camera.link).toEqual({ measuredDownloadS: 1.2 });
    expect(rig2.camera.pixelSizeUm).toBe(3.76);
  });
});

describe('rigInputSchema errors name the field in plain English', () => {
  it('numbers: type, range and whole numbers', () => {
    expect(issues({ optics: { focalLengthMm: 'long' } })).toEqual([{ path: 'optics.focalLengthMm', message: 'Focal length must be a number' }]);
    expect(issues({ optics: { focalLengthMm: -5 } })).toEqual([{ path: 'optics.focalLengthMm', message: 'Focal length must be between 10 and 20000 mm' }]);
    expect(issues({ camera: { sensorWidthPx: 100.5 } })).toEqual([{ path: 'camera.sensorWidthPx', message: 'Sensor width must be a whole number' }]);
    expect(issues({ mount: { park: { azDeg: 400 } } })).toEqual([{ path: 'mount.park.azDeg', message: 'Park azimuth must be between 0 and 360°' }]);
  });

  it('camera link: usb3, usb2 or a measured time', () => {
    expect(issues({ camera: { link: 'usb4' } })[0]?.message).toBe('Choose usb3, usb2 or give a measured download time in seconds');
    expect(issues({ camera: { link: { measuredDownloadS: 0 } } })[0]).toEqual({ path: 'camera.link.measuredDownloadS', message: 'Measured download time must be between 0.01 and 120 s' });
    expect(issues({ camera: { link: 'usb2' } })).toEqual([]);
  });

  it('filter wheel: unique names, known bands, at least one slot', () => {
    const twice = { filterWheel: { slots: [{ name: 'Ha', band: 'Ha' }, { name: 'ha', band: 'Ha' }] } };
    expect(issues(twice)).toEqual([{ path: 'filterWheel.slots.1.name', message: 'Two slots are named "ha"' }]);
    expect(issues({ filterWheel: { slots: [{ name: 'X', band: 'UV' }] } })[0]?.message).toBe('Band is one of L, R, G, B, Ha, OIII, SII, custom');
    expect(issues({ filterWheel: { slots: [] } })[0]?.path).toBe('filterWheel.slots');
    expect(rigInputSchema.parse({ filterWheel: { slots: [{ name: 'Duo' }] } }).filterWheel.slots).toEqual([{ name: 'Duo', band: 'custom', focusOffsetSteps: 0 }]);
  });

  it('presets and readout modes are unique', () => {
    expect(issues({ camera: { gainPresets: [{ name: 'A', value: 0 }, { name: 'B', value: 0 }] } })).toEqual([{ path: 'camera.gainPresets.1.value', message: 'Two gain presets have the value 0' }]);
    expect(issues({ camera: { readoutModes: ['Fast', 'fast'] } })[0]?.path).toBe('camera.readoutModes.1');
  });

  it('rotator: max above min, at most 360° of travel (cable wrap)', () => {
    expect(issues({ rotator: { minDeg: 100, maxDeg: 50 } })).toEqual([{ path: 'rotator.maxDeg', message: 'Maximum angle must be above the minimum angle' }]);
    expect(issues({ rotator: { minDeg: -180, maxDeg: 270 } })).toEqual([{ path: 'rotator.maxDeg', message: 'Rotator travel may span at most 360° (cable wrap)' }]);
    expect(issues({ rotator: { present: true, minDeg: -180, maxDeg: 180 } })).toEqual([]);
  });

  it('meridian: a German mount flips before its tracking limit; a fork mount is not checked', () => {
    const late = { meridian: { trackPastMin: 2, flipDelayS: 300 } };
    expect(issues({ mount: late })).toEqual([{ path: 'mount.meridian.flipDelayS', message: 'The flip must happen before the mount stops tracking past the meridian' }]);
    expect(issues({ mount: { ...late, type: 'fork' } })).toEqual([]);
    expect(issues({ mount: { type: 'dobson' } })[0]?.message).toBe('Mount type is german-equatorial, fork or alt-az');
  });
});

describe('rigSchema (stored)', () => {
  it('adds id, version and timestamps to the edited fields', () => {
    const stored = { ...defaultRigInput(), id: '1b4e28ba-2fa1-41d2-883f-0016d3cca427', version: 1, createdAt: 'x', updatedAt: 'y' };
    expect(rigSchema.parse(stored)).toEqual(stored);
    expect(rigSchema.safeParse({ ...stored, id: 'nope' }).success).toBe(false);
  });
});

describe('unusualRigValues (usual ranges of trade-defaults.md)', () => {
  it('the defaults are all usual', () => {
    expect(unusualRigValues(defaultRigInput())).toEqual([]);
  });

  it('flags a 45 °C cooler (S2: 25–40 °C) and a fast mount, but saves them', () => {
    const rig = rigInputSchema.parse({ camera: { cooling: { maxDeltaBelowAmbientC: 45 } }, mount: { maxSlewRateDegPerS: { axis1: 8 } } });
    const notes = unusualRigValues(rig);
    expect(notes.map((n) => n.path)).toEqual(['camera.cooling.maxDeltaBelowAmbientC', 'mount.maxSlewRateDegPerS.axis1']);
    expect(notes[0]?.message).toBe('Largest drop below ambient of 45 °C is outside the usual 25–40 °C (S2)');
  });

  it('ignores guider settings without a guider', () => {
    const rig = rigInputSchema.parse({ guider: { present: false, settlePx: 5 } });
    expect(unusualRigValues(rig)).toEqual([]);
  });
});
