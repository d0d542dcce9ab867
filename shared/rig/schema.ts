import { z } from 'zod';
import { RIG_DEFAULTS as D } from '@/shared/rig/defaults';
import { between, duplicateIndexes, whole } from '@/shared/rig/fields';

/*
 * One schema for the rig form, the API body and the YAML plan. Every field has a default so a
 * partial document (an older plan, a half-filled form) parses to a complete rig. Limits here are
 * hard limits of plausible hardware; the narrower "usual" ranges of trade-defaults.md are
 * advisory and live in `typical-ranges.ts`, so an unusual but real camera can still be saved.
 */

const presetName = z.string({ error: 'Name must be text' }).trim().min(1, 'Give the preset a name').max(40, 'At most 40 characters');

/** A named camera setting (gain or offset), the camera's own unitless number. */
export const cameraPresetSchema = z.object({
  name: presetName,
  value: between('Preset value', '', 0, 100000),
});

function presetList(what: string, fallback: { name: string; value: number }[]) {
  return z
    .array(cameraPresetSchema)
    .max(20, `At most 20 ${what} presets`)
    .superRefine((list, ctx) => {
      for (const i of duplicateIndexes(list, (p) => p.name.toLowerCase())) ctx.addIssue({ code: 'custom', path: [i, 'name'], message: `Two ${what} presets are named "${list[i]?.name}"` });
      for (const i of duplicateIndexes(list, (p) => p.value)) ctx.addIssue({ code: 'custom', path: [i, 'value'], message: `Two ${what} presets have the value ${list[i]?.value}` });
    })
    .default(() => fallback.map((p) => ({ ...p })));
}

export const opticsSchema = z
  .object({
    focalLengthMm: between('Focal length', 'mm', 10, 20000).default(D.optics.focalLengthMm),
    apertureMm: between('Aperture', 'mm', 5, 5000).default(D.optics.apertureMm),
    /** Focal reducer (< 1) or barlow (> 1) factor; 1 without either. */
    reducerFactor: between('Reducer or barlow factor', '', 0.2, 5).default(D.optics.reducerFactor),
  })
  .prefault({});

/** How long a full frame takes to reach the computer: a USB generation or a measured time. */
export const cameraLinkSchema = z.union(
  [z.literal('usb3'), z.literal('usb2'), z.object({ measuredDownloadS: between('Measured download time', 's', 0.01, 120) })],
  { error: 'Choose usb3, usb2 or give a measured download time in seconds' },
);

export const cameraSchema = z
  .object({
    sensorWidthPx: whole('Sensor width', 'px', 16, 100000).default(D.camera.sensorWidthPx),
    sensorHeightPx: whole('Sensor height', 'px', 16, 100000).default(D.camera.sensorHeightPx),
    pixelSizeUm: between('Pixel size', 'µm', 0.5, 50).default(D.camera.pixelSizeUm),
    bitDepth: whole('Bit depth', 'bits', 8, 16).default(D.camera.bitDepth),
    link: cameraLinkSchema.default(D.camera.link),
    cooling: z
      .object({
        /** 0 for an uncooled camera. */
        maxDeltaBelowAmbientC: between('Largest drop below ambient', '°C', 0, 60).default(D.camera.cooling.maxDeltaBelowAmbientC),
        rateCPerMin: between('Cooling rate', '°C/min', 0.1, 30).default(D.camera.cooling.rateCPerMin),
      })
      .prefault({}),
    gainPresets: presetList('gain', D.camera.gainPresets),
    offsetPresets: presetList('offset', D.camera.offsetPresets),
    readoutModes: z
      .array(z.string({ error: 'Mode must be text' }).trim().min(1, 'Give the readout mode a name').max(40, 'At most 40 characters'))
      .max(10, 'At most 10 readout modes')
      .superRefine((list, ctx) => {
        for (const i of duplicateIndexes(list, (m) => m.toLowerCase())) ctx.addIssue({ code: 'custom', path: [i], message: `Readout mode "${list[i]}" is listed twice` });
      })
      .default(() => [...D.camera.readoutModes]),
  })
  .prefault({});

export const FILTER_BANDS = ['L', 'R', 'G', 'B', 'Ha', 'OIII', 'SII', 'custom'] as const;
export const filterBandSchema = z.enum(FILTER_BANDS, { error: `Band is one of ${FILTER_BANDS.join(', ')}` });

export const filterSlotSchema = z.object({
  name: z.string({ error: 'Filter name must be text' }).trim().min(1, 'Give the filter a name').max(24, 'At most 24 characters'),
  band: filterBandSchema.default('custom'),
  /** Focuser steps to add when this filter is in the beam, relative to the focus reference. */
  focusOffsetSteps: whole('Focus offset', 'steps', -100000, 100000).default(0),
});

export const filterWheelSchema = z
  .object({
    /** Slots in wheel order; a camera without a wheel has one slot naming the fitted filter. */
    slots: z
      .array(filterSlotSchema)
      .min(1, 'Add at least one filter (without a wheel, the filter that is fitted)')
      .max(20, 'At most 20 filter slots')
      .superRefine((slots, ctx) => {
        for (const i of duplicateIndexes(slots, (s) => s.name.toLowerCase())) ctx.addIssue({ code: 'custom', path: [i, 'name'], message: `Two slots are named "${slots[i]?.name}"` });
      })
      .default(() => D.filterWheel.slots.map((s) => ({ ...s }))),
    changeTimeS: between('Filter change time', 's', 0, 60).default(D.filterWheel.changeTimeS),
  })
  .prefault({});

export const focuserSchema = z
  .object({
    stepSizeUm: between('Focuser step size', 'µm', 0.01, 100).default(D.focuser.stepSizeUm),
    backlashSteps: whole('Backlash', 'steps', 0, 100000).default(D.focuser.backlashSteps),
    /** Steps to move per °C of temperature change (sign as the focuser moves outward). */
    tempCoeffStepsPerC: between('Temperature coefficient', 'steps/°C', -10000, 10000).default(D.focuser.tempCoeffStepsPerC),
  })
  .prefault({});

export const rotatorSchema = z
  .object({
    present: z.boolean({ error: 'Say whether a rotator is fitted' }).default(D.rotator.present),
    /** Mechanical travel limits (cable wrap), degrees of the rotator's own scale. */
    minDeg: between('Rotator minimum angle', '°', -360, 360).default(D.rotator.minDeg),
    maxDeg: between('Rotator maximum angle', '°', -360, 720).default(D.rotator.maxDeg),
    speedDegPerS: between('Rotator speed', '°/s', 0.1, 90).default(D.rotator.speedDegPerS),
    /** Sky position angle = mechanical angle + skyOffsetDeg (mod 360), east of north. */
    skyOffsetDeg: between('Rotator sky offset', '°', -360, 360).default(D.rotator.skyOffsetDeg),
  })
  .prefault({})
  .superRefine((r, ctx) => {
    if (r.maxDeg <= r.minDeg) ctx.addIssue({ code: 'custom', path: ['maxDeg'], message: 'Maximum angle must be above the minimum angle' });
    else if (r.maxDeg - r.minDeg > 360) ctx.addIssue({ code: 'custom', path: ['maxDeg'], message: 'Rotator travel may span at most 360° (cable wrap)' });
  });

export const MOUNT_TYPES = ['german-equatorial', 'fork', 'alt-az'] as const;

export const mountSchema = z
  .object({
    type: z.enum(MOUNT_TYPES, { error: 'Mount type is german-equatorial, fork or alt-az' }).default(D.mount.type),
    /** axis1 = RA (or azimuth), axis2 = Dec (or altitude). */
    maxSlewRateDegPerS: z
      .object({
        axis1: between('Slew rate of axis 1', '°/s', 0.1, 30).default(D.mount.maxSlewRateDegPerS.axis1),
        axis2: between('Slew rate of axis 2', '°/s', 0.1, 30).default(D.mount.maxSlewRateDegPerS.axis2),
      })
      .prefault({}),
    /** Time from rest to full slew rate. */
    accelerationS: between('Time to full slew rate', 's', 0, 20).default(D.mount.accelerationS),
    settleS: between('Settle time', 's', 0, 120).default(D.mount.settleS),
    meridian: z
      .object({
        /** How far past the meridian the mount can track before its hour-angle limit. */
        trackPastMin: between('Tracking past the meridian', 'min', 0, 240).default(D.mount.meridian.trackPastMin),
        /** When the flip happens, counted from the meridian crossing. */
        flipDelayS: between('Flip delay', 's', 0, 3600).default(D.mount.meridian.flipDelayS),
      })
      .prefault({}),
    park: z
      .object({
        altDeg: between('Park altitude', '°', -90, 90).default(D.mount.park.altDeg),
        azDeg: between('Park azimuth', '°', 0, 360).default(D.mount.park.azDeg),
      })
      .prefault({}),
  })
  .prefault({})
  .superRefine((m, ctx) => {
    if (m.type === 'german-equatorial' && m.meridian.flipDelayS > m.meridian.trackPastMin * 60) {
      ctx.addIssue({ code: 'custom', path: ['meridian', 'flipDelayS'], message: 'The flip must happen before the mount stops tracking past the meridian' });
    }
  });

export const guiderSchema = z
  .object({
    present: z.boolean({ error: 'Say whether a guider is fitted' }).default(D.guider.present),
    pixelSizeUm: between('Guide camera pixel size', 'µm', 0.5, 50).default(D.guider.pixelSizeUm),
    /** Guide scope focal length; for an off-axis guider, the main optics' effective focal length. */
    focalLengthMm: between('Guide focal length', 'mm', 10, 20000).default(D.guider.focalLengthMm),
    settlePx: between('Settle threshold', 'px', 0.1, 10).default(D.guider.settlePx),
    settleTimeS: between('Settle time', 's', 0, 300).default(D.guider.settleTimeS),
    settleTimeoutS: between('Settle timeout', 's', 1, 900).default(D.guider.settleTimeoutS),
    /** Time to start guiding, calibration included. */
    startS: between('Guiding start time', 's', 0, 1800).default(D.guider.startS),
  })
  .prefault({});

/** A rig (equipment profile) as the form, the API and the YAML plan carry it. */
export const rigInputSchema = z.object({
  name: z.string({ error: 'Name must be text' }).trim().min(1, 'Give the rig a name').max(80, 'At most 80 characters').default(D.name),
  optics: opticsSchema,
  camera: cameraSchema,
  filterWheel: filterWheelSchema,
  focuser: focuserSchema,
  rotator: rotatorSchema,
  mount: mountSchema,
  guider: guiderSchema,
});

/** A complete, validated rig as the user edits it (like `SiteInput`). */
export type RigInput = z.output<typeof rigInputSchema>;
/** What a form, API body or plan may send: defaults make every field optional. */
export type RigInputRaw = z.input<typeof rigInputSchema>;
export type CameraLink = z.output<typeof cameraLinkSchema>;
export type FilterBand = (typeof FILTER_BANDS)[number];
export type FilterSlot = z.output<typeof filterSlotSchema>;
export type MountType = (typeof MOUNT_TYPES)[number];

/** A complete rig with the defaults of trade-defaults.md (a fresh copy each call). */
export function defaultRigInput(): RigInput {
  return rigInputSchema.parse({});
}

/** A stored rig as the API returns it; `version` guards concurrent edits. */
export const rigSchema = rigInputSchema.extend({
  id: z.string().uuid(),
  version: z.number().int().positive(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Rig = z.output<typeof rigSchema>;

/** Update body: the edited fields plus the version the client last saw. */
export const rigUpdateSchema = rigInputSchema.extend({ version: z.number().int().positive() });
export type RigUpdate = z.output<typeof rigUpdateSchema>;
