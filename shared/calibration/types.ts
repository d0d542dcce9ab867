import type { CaptureFrameType } from '@/shared/schemas/calibration-api';

/**
 * A frame as intake reads it from one FITS header, before it is stored: everything the
 * `capture_frame` row holds except owner, intake id and the night date (which needs the site).
 */
export interface IntakeFrame {
  fingerprint: string;
  fileName: string;
  frameType: CaptureFrameType;
  object: string | null;
  /** DATE-OBS as ISO 8601 UTC. */
  takenAt: string;
  exposureS: number;
  filter: string | null;
  gain: number | null;
  offset: number | null;
  binning: number;
  readoutMode: string | null;
  setTempC: number | null;
  sensorTempC: number | null;
  focuserPositionSteps: number | null;
  rotatorAngleDeg: number | null;
  pierSide: 'east' | 'west' | null;
  pointingRaDeg: number | null;
  pointingDecDeg: number | null;
  wcsRaDeg: number | null;
  wcsDecDeg: number | null;
  wcsPositionAngleDeg: number | null;
  wcsScaleArcsecPerPx: number | null;
  wcsMirrored: boolean | null;
}

/** A stored frame: the intake fields plus the night it belongs to. */
export interface StoredFrame extends IntakeFrame {
  nightDate: string;
}

/** A target as history links lights to it. */
export interface HistoryTargetRef {
  id: string;
  designation: string;
  name: string;
  aliases: string[];
  raDeg: number;
  decDeg: number;
  framings: { id: string; raDeg: number; decDeg: number; positionAngleDeg: number }[];
}
