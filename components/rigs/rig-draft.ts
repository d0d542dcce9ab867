import { parseNumberText } from '@/lib/number-text';
import type { FilterBand, MountType, RigInput } from '@/shared/rig/schema';

/*
 * The rig form's raw values: the shape of `RigInput`, with numbers kept as the text the user
 * typed (so "-4", "3," or an empty field can be edited) and list items carrying a stable key.
 */

export type LinkKind = 'usb3' | 'usb2' | 'measured';
export type SlotDraft = { key: string; name: string; band: FilterBand; focusOffsetSteps: string };
export type PresetDraft = { key: string; name: string; value: string };
export type ModeDraft = { key: string; name: string };

export type RigDraft = {
  name: string;
  optics: { focalLengthMm: string; apertureMm: string; reducerFactor: string };
  camera: {
    sensorWidthPx: string;
    sensorHeightPx: string;
    pixelSizeUm: string;
    bitDepth: string;
    /** `camera.link` in the rig: a USB generation, or a measured time when kind is "measured". */
    link: { kind: LinkKind; measuredDownloadS: string };
    cooling: { maxDeltaBelowAmbientC: string; rateCPerMin: string };
    gainPresets: PresetDraft[];
    offsetPresets: PresetDraft[];
    readoutModes: ModeDraft[];
  };
  filterWheel: { slots: SlotDraft[]; changeTimeS: string };
  focuser: { stepSizeUm: string; backlashSteps: string; tempCoeffStepsPerC: string };
  rotator: { present: boolean; minDeg: string; maxDeg: string; speedDegPerS: string; skyOffsetDeg: string };
  mount: {
    type: MountType;
    maxSlewRateDegPerS: { axis1: string; axis2: string };
    accelerationS: string;
    settleS: string;
    meridian: { trackPastMin: string; flipDelayS: string };
    park: { altDeg: string; azDeg: string };
  };
  guider: { present: boolean; pixelSizeUm: string; focalLengthMm: string; settlePx: string; settleTimeS: string; settleTimeoutS: string; startS: string };
};

/** Lists of the draft, by their dotted path. */
export type RigListPath = 'filterWheel.slots' | 'camera.gainPresets' | 'camera.offsetPresets' | 'camera.readoutModes';

let nextKey = 0;
/** A key for a new list row, unique for this page load. */
export function newRowKey(): string {
  nextKey += 1;
  return `row-${nextKey}`;
}

const text = (n: number) => String(n);

function cameraDraft(c: RigInput['camera']): RigDraft['camera'] {
  const link = c.link;
  return {
    sensorWidthPx: text(c.sensorWidthPx),
    sensorHeightPx: text(c.sensorHeightPx),
    pixelSizeUm: text(c.pixelSizeUm),
    bitDepth: text(c.bitDepth),
    link: typeof link === 'object' ? { kind: 'measured', measuredDownloadS: text(link.measuredDownloadS) } : { kind: link, measuredDownloadS: '' },
    cooling: { maxDeltaBelowAmbientC: text(c.cooling.maxDeltaBelowAmbientC), rateCPerMin: text(c.cooling.rateCPerMin) },
    gainPresets: c.gainPresets.map((p) => ({ key: newRowKey(), name: p.name, value: text(p.value) })),
    offsetPresets: c.offsetPresets.map((p) => ({ key: newRowKey(), name: p.name, value: text(p.value) })),
    readoutModes: c.readoutModes.map((name) => ({ key: newRowKey(), name })),
  };
}

function mountDraft(m: RigInput['mount']): RigDraft['mount'] {
  return {
    type: m.type,
    maxSlewRateDegPerS: { axis1: text(m.maxSlewRateDegPerS.axis1), axis2: text(m.maxSlewRateDegPerS.axis2) },
    accelerationS: text(m.accelerationS),
    settleS: text(m.settleS),
    meridian: { trackPastMin: text(m.meridian.trackPastMin), flipDelayS: text(m.meridian.flipDelayS) },
    park: { altDeg: text(m.park.altDeg), azDeg: text(m.park.azDeg) },
  };
}

/** The editable text of a complete rig. */
export function rigToDraft(rig: RigInput): RigDraft {
  const { optics: o, focuser: f, rotator: r, guider: g } = rig;
  return {
    name: rig.name,
    optics: { focalLengthMm: text(o.focalLengthMm), apertureMm: text(o.apertureMm), reducerFactor: text(o.reducerFactor) },
    camera: cameraDraft(rig.camera),
    filterWheel: {
      slots: rig.filterWheel.slots.map((s) => ({ key: newRowKey(), name: s.name, band: s.band, focusOffsetSteps: text(s.focusOffsetSteps) })),
      changeTimeS: text(rig.filterWheel.changeTimeS),
    },
    focuser: { stepSizeUm: text(f.stepSizeUm), backlashSteps: text(f.backlashSteps), tempCoeffStepsPerC: text(f.tempCoeffStepsPerC) },
    rotator: { present: r.present, minDeg: text(r.minDeg), maxDeg: text(r.maxDeg), speedDegPerS: text(r.speedDegPerS), skyOffsetDeg: text(r.skyOffsetDeg) },
    mount: mountDraft(rig.mount),
    guider: {
      present: g.present,
      pixelSizeUm: text(g.pixelSizeUm),
      focalLengthMm: text(g.focalLengthMm),
      settlePx: text(g.settlePx),
      settleTimeS: text(g.settleTimeS),
      settleTimeoutS: text(g.settleTimeoutS),
      startS: text(g.startS),
    },
  };
}

const num = parseNumberText;

/** Every text leaf a number (NaN when not one); no defaults filled in, so empty fields fail the schema. */
function numbersOf<T extends Record<string, string>>(group: T): { [K in keyof T]: number } {
  return Object.fromEntries(Object.entries(group).map(([k, v]) => [k, num(v)])) as { [K in keyof T]: number };
}

/** The draft in the shape `rigInputSchema` checks (and the derived panel reads). */
export function draftToInput(d: RigDraft): RigInput {
  const { link, cooling, gainPresets, offsetPresets, readoutModes, ...sensor } = d.camera;
  const { present: rotatorPresent, ...rotator } = d.rotator;
  const { present: guiderPresent, ...guider } = d.guider;
  const { type, maxSlewRateDegPerS, meridian, park, ...mountTimes } = d.mount;
  return {
    name: d.name,
    optics: numbersOf(d.optics),
    camera: {
      ...numbersOf(sensor),
      link: link.kind === 'measured' ? { measuredDownloadS: num(link.measuredDownloadS) } : link.kind,
      cooling: numbersOf(cooling),
      gainPresets: gainPresets.map((p) => ({ name: p.name, value: num(p.value) })),
      offsetPresets: offsetPresets.map((p) => ({ name: p.name, value: num(p.value) })),
      readoutModes: readoutModes.map((m) => m.name),
    },
    filterWheel: { slots: d.filterWheel.slots.map((s) => ({ name: s.name, band: s.band, focusOffsetSteps: num(s.focusOffsetSteps) })), changeTimeS: num(d.filterWheel.changeTimeS) },
    focuser: numbersOf(d.focuser),
    rotator: { present: rotatorPresent, ...numbersOf(rotator) },
    mount: { type, maxSlewRateDegPerS: numbersOf(maxSlewRateDegPerS), ...numbersOf(mountTimes), meridian: numbersOf(meridian), park: numbersOf(park) },
    guider: { present: guiderPresent, ...numbersOf(guider) },
  };
}

/** Reads a value by dotted path ("optics.focalLengthMm", "filterWheel.slots.2.name"). */
export function getIn(root: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((node, key) => (node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined), root);
}

/** A copy of `root` with the value at a dotted path replaced (arrays copied as arrays). */
export function setIn<T>(root: T, path: string, value: unknown): T {
  const [head, ...rest] = path.split('.');
  if (head === undefined) return root;
  const node = root as Record<string, unknown> | unknown[];
  const child = rest.length === 0 ? value : setIn((node as Record<string, unknown>)[head], rest.join('.'), value);
  if (Array.isArray(node)) {
    const copy = [...node];
    copy[Number(head)] = child;
    return copy as T;
  }
  return { ...node, [head]: child } as T;
}
