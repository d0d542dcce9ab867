import type { FieldSize, FramingShape } from '@/components/charts/framing-geometry';
import { parseNumberText } from '@/lib/number-text';
import { useZodForm } from '@/hooks/use-zod-form';
import type { FieldErrors } from '@/lib/api';
import { rigImaging } from '@/shared/rig/optics';
import { defaultRigInput, type Rig } from '@/shared/rig/schema';
import { framingInputSchema, type Framing, type Target } from '@/shared/schemas/target';
import { decTextSchema, formatDec, formatRa, parseDec, parseRa, raTextSchema } from '@/shared/targets/schema';

/** The framing form: centre as typed RA/Dec text, the rest from the shared framing schema. */
export const framingFormSchema = framingInputSchema
  .pick({ name: true, positionAngleDeg: true, mosaicCols: true, mosaicRows: true, overlapPct: true, rigId: true })
  .extend({ ra: raTextSchema, dec: decTextSchema });

/** Raw values as typed: numbers stay text until parsed; '' is "no rig". */
export type FramingValues = {
  name: string;
  ra: string;
  dec: string;
  positionAngleDeg: string;
  mosaicCols: string;
  mosaicRows: string;
  overlapPct: string;
  rigId: string;
};

function toInput(v: FramingValues) {
  return {
    name: v.name,
    ra: v.ra,
    dec: v.dec,
    positionAngleDeg: parseNumberText(v.positionAngleDeg),
    mosaicCols: parseNumberText(v.mosaicCols),
    mosaicRows: parseNumberText(v.mosaicRows),
    overlapPct: parseNumberText(v.overlapPct),
    rigId: v.rigId === '' ? null : v.rigId,
  };
}

/** "330", "12.5": angles to a hundredth of a degree, normalised to [0, 360). */
export function angleText(deg: number): string {
  const rounded = Math.round((((deg % 360) + 360) % 360) * 100) / 100;
  return String(rounded === 360 ? 0 : rounded);
}

export function framingValues(framing: Framing | null, target: Target, defaultRigId: string): FramingValues {
  if (!framing) {
    return {
      name: `Framing ${target.framings.length + 1}`,
      ra: formatRa(target.raDeg),
      dec: formatDec(target.decDeg),
      positionAngleDeg: '0',
      mosaicCols: '1',
      mosaicRows: '1',
      overlapPct: '10',
      rigId: defaultRigId,
    };
  }
  return {
    name: framing.name,
    ra: formatRa(framing.raDeg),
    dec: formatDec(framing.decDeg),
    positionAngleDeg: angleText(framing.positionAngleDeg),
    mosaicCols: String(framing.mosaicCols),
    mosaicRows: String(framing.mosaicRows),
    overlapPct: String(framing.overlapPct),
    rigId: framing.rigId ?? '',
  };
}

export function useFramingForm(initial: FramingValues) {
  return useZodForm({ schema: framingFormSchema, initial, toInput });
}
export type FramingFormState = ReturnType<typeof useFramingForm>;

/** The API names the centre by its stored fields; the form by what is typed. */
export function framingFieldErrors(fields: FieldErrors): FieldErrors {
  const rename: Record<string, string> = { raDeg: 'ra', decDeg: 'dec' };
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [rename[k] ?? k, v]));
}

const clampInt = (text: string, min: number, max: number, fallback: number) => {
  const n = Math.round(parseNumberText(text));
  return Number.isFinite(n) ? Math.min(max, Math.max(min, n)) : fallback;
};

/** What the preview draws while typing: each value as far as it reads, else the target's own. */
export function previewShape(v: FramingValues, target: Target): FramingShape {
  const ra = parseRa(v.ra);
  const dec = parseDec(v.dec);
  const pa = parseNumberText(v.positionAngleDeg);
  const overlap = parseNumberText(v.overlapPct);
  return {
    raDeg: ra.ok ? ra.valueDeg : target.raDeg,
    decDeg: dec.ok ? dec.valueDeg : target.decDeg,
    positionAngleDeg: Number.isFinite(pa) ? pa : 0,
    mosaicCols: clampInt(v.mosaicCols, 1, 10, 1),
    mosaicRows: clampInt(v.mosaicRows, 1, 10, 1),
    overlapPct: Number.isFinite(overlap) ? Math.min(50, Math.max(0, overlap)) : 10,
  };
}

export type FieldOfView = FieldSize & { label: string };

/** The camera field of the chosen rig (binning 1), or of the example rig when none is chosen. */
export function fieldOfView(rig: Rig | undefined): FieldOfView {
  const imaging = rigImaging(rig ?? defaultRigInput());
  const size = `${imaging.fieldWidthDeg.toFixed(2)}° × ${imaging.fieldHeightDeg.toFixed(2)}°`;
  return {
    widthArcmin: imaging.fieldWidthDeg * 60,
    heightArcmin: imaging.fieldHeightDeg * 60,
    label: rig ? `${rig.name}: field ${size}, ${imaging.pixelScaleArcsecPerPx.toFixed(2)}″/px` : `No rig chosen: example field ${size}`,
  };
}
