import type { IntakeFrame } from '@/shared/calibration/types';
import { frameFromHeader, type FrameRecord } from '@/shared/fits/frame';
import { FitsHeaderError, parseFitsHeader, type FitsHeader } from '@/shared/fits/header';
import { wcsFromHeader } from '@/shared/fits/wcs';
import { currentNightDate } from '@/shared/night-date';

export type IntakeOutcome = { ok: true; frame: IntakeFrame } | { ok: false; name: string; reason: string; kind: string };

/** Why intake refuses a header that parsed: a keyword the record cannot do without. */
export type IntakeRejectKind = 'no-frame-type' | 'no-date' | 'no-exposure' | 'no-temperature';

type Refusal = { kind: IntakeRejectKind; reason: string };

/** The raw text of a keyword for a message, or undefined when the card is absent. */
function shown(h: FitsHeader, keyword: string): string | undefined {
  const v = h.get(keyword);
  return v === undefined || v === null ? undefined : String(v).trim();
}

function frameTypeRefusal(h: FitsHeader): Refusal {
  const found = shown(h, 'IMAGETYP');
  const reason = found
    ? `IMAGETYP says "${found}", which is not a light, dark, flat or bias frame`
    : 'No IMAGETYP card: the frame type (light, dark, flat or bias) is needed';
  return { kind: 'no-frame-type', reason };
}

function dateRefusal(h: FitsHeader): Refusal {
  const found = shown(h, 'DATE-OBS');
  const reason = found
    ? `DATE-OBS says "${found}", which is not a UTC date and time (YYYY-MM-DDThh:mm:ss)`
    : 'No DATE-OBS card: the time the frame was taken is needed';
  return { kind: 'no-date', reason };
}

function exposureRefusal(f: FrameRecord): Refusal | null {
  if (f.exposureS === undefined) {
    if (f.frameType === 'bias') return null;
    return { kind: 'no-exposure', reason: 'No EXPTIME or EXPOSURE card: the exposure time is needed' };
  }
  if (f.exposureS < 0) return { kind: 'no-exposure', reason: `The exposure time is ${f.exposureS} s, below zero` };
  return null;
}

function temperatureRefusal(f: FrameRecord): Refusal | null {
  if (f.frameType !== 'dark' || f.setTempC !== undefined || f.sensorTempC !== undefined) return null;
  return { kind: 'no-temperature', reason: 'A dark needs SET-TEMP or CCD-TEMP: darks match lights by sensor temperature' };
}

/** The plate solution's centre, PA, scale and mirroring, all null without a solved centre. */
function wcsFields(h: FitsHeader): Pick<IntakeFrame, 'wcsRaDeg' | 'wcsDecDeg' | 'wcsPositionAngleDeg' | 'wcsScaleArcsecPerPx' | 'wcsMirrored'> {
  const wcs = wcsFromHeader(h);
  if (!wcs?.centre) return { wcsRaDeg: null, wcsDecDeg: null, wcsPositionAngleDeg: null, wcsScaleArcsecPerPx: null, wcsMirrored: null };
  return { wcsRaDeg: wcs.centre.raDeg, wcsDecDeg: wcs.centre.decDeg, wcsPositionAngleDeg: wcs.positionAngleDeg, wcsScaleArcsecPerPx: wcs.pixelScaleArcsecPerPx, wcsMirrored: wcs.mirrored };
}

/**
 * One file's header bytes → a frame to record, or the reason it cannot be: the strict parser's
 * error (truncated, missing END, non-ASCII, …), or a keyword the record needs (IMAGETYP naming
 * light/dark/flat/bias, DATE-OBS, EXPTIME/EXPOSURE except for bias where it defaults to 0, and
 * SET-TEMP or CCD-TEMP for a dark, which darks are matched by).
 */
export function readIntakeFile(name: string, bytes: Uint8Array): IntakeOutcome {
  let h: FitsHeader;
  try {
    h = parseFitsHeader(bytes);
  } catch (err) {
    if (err instanceof FitsHeaderError) return { ok: false, name, reason: err.message, kind: err.kind };
    throw err;
  }
  const f = frameFromHeader(h);
  const { frameType, dateObsUtc } = f;
  if (frameType === null) return { ok: false, name, ...frameTypeRefusal(h) };
  if (dateObsUtc === undefined) return { ok: false, name, ...dateRefusal(h) };
  const refusal = exposureRefusal(f) ?? temperatureRefusal(f);
  if (refusal) return { ok: false, name, ...refusal };
  const frame: IntakeFrame = {
    fingerprint: f.fingerprint,
    fileName: name,
    frameType,
    object: f.object ?? null,
    takenAt: dateObsUtc,
    exposureS: f.exposureS ?? 0,
    filter: f.filter ?? null,
    gain: f.gain ?? null,
    offset: f.offset ?? null,
    binning: f.binning?.x ?? 1,
    readoutMode: f.readoutMode ?? null,
    setTempC: f.setTempC ?? null,
    sensorTempC: f.sensorTempC ?? null,
    focuserPositionSteps: f.focuserPositionSteps === undefined ? null : Math.round(f.focuserPositionSteps),
    rotatorAngleDeg: f.rotatorAngleDeg ?? null,
    pierSide: f.pierSide ?? null,
    pointingRaDeg: f.raDeg ?? null,
    pointingDecDeg: f.decDeg ?? null,
    ...wcsFields(h),
  };
  return { ok: true, frame };
}

/** The night (evening date) a frame taken at `takenAtIso` belongs to in `timeZone`: before local noon it is the previous evening's night. */
export function frameNightDate(takenAtIso: string, timeZone: string): string {
  return currentNightDate(timeZone, new Date(takenAtIso));
}
