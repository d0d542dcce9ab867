import { getIn } from '@/components/rigs/rig-draft';
import {
  cameraDownloadTimeS,
  ditherMainPxToGuidePx,
  effectiveFocalLengthMm,
  fieldOfViewDeg,
  focalRatio,
  guidePixelScaleArcsecPerPx,
  pixelScaleArcsecPerPx,
  skyAreaDeg2,
} from '@/shared/rig/optics';
import type { RigInput } from '@/shared/rig/schema';

/** The usual dither, main-camera pixels (trade-defaults.md "dither", S13). */
export const USUAL_DITHER_PX = 5;

export type DerivedItem = {
  key: 'focal' | 'ratio' | 'pixel-scale' | 'fov' | 'area' | 'download' | 'guide-scale' | 'dither';
  label: string;
  /** null while an input it needs is missing or invalid. */
  value: string | null;
  detail?: string;
  /** The formula and where it comes from, in small print. */
  source: string;
};

const fixed = (n: number, digits: number) => n.toFixed(digits);

/** Derived quantities of a rig being edited; each needs only its own inputs to be valid. */
export function deriveRig(rig: RigInput, errors: Record<string, string>): DerivedItem[] {
  const ok = (...paths: string[]) => paths.every((p) => !errors[p] && Number.isFinite(getIn(rig, p) as number));
  const { optics: o, camera: c, guider: g } = rig;
  const hasF = ok('optics.focalLengthMm', 'optics.reducerFactor');
  const f = hasF ? effectiveFocalLengthMm(o.focalLengthMm, o.reducerFactor) : NaN;
  const hasScale = hasF && ok('camera.pixelSizeUm');
  const scale = hasScale ? pixelScaleArcsecPerPx(c.pixelSizeUm, f) : NaN;
  const hasFov = hasScale && ok('camera.sensorWidthPx', 'camera.sensorHeightPx');
  const w = hasFov ? fieldOfViewDeg(c.sensorWidthPx, c.pixelSizeUm, f) : NaN;
  const h = hasFov ? fieldOfViewDeg(c.sensorHeightPx, c.pixelSizeUm, f) : NaN;
  const linkOk = typeof c.link === 'string' || (!errors['camera.link'] && ok('camera.link.measuredDownloadS'));
  const hasDownload = linkOk && ok('camera.sensorWidthPx', 'camera.sensorHeightPx', 'camera.bitDepth');
  const hasGuide = g.present && ok('guider.pixelSizeUm', 'guider.focalLengthMm');
  const guideScale = hasGuide ? guidePixelScaleArcsecPerPx(g) : NaN;
  const linkText = typeof c.link === 'object' ? 'measured on the rig' : c.link === 'usb3' ? 'USB 3 ≈ 250 MB/s' : 'USB 2 ≈ 35 MB/s';

  return [
    { key: 'focal', label: 'Effective focal length', value: hasF ? `${fixed(f, 0)} mm` : null, source: 'Focal length × reducer or barlow factor.' },
    { key: 'ratio', label: 'Focal ratio', value: hasF && ok('optics.apertureMm') ? `f/${fixed(focalRatio(o.focalLengthMm, o.apertureMm, o.reducerFactor), 1)}` : null, source: 'Effective focal length ÷ aperture.' },
    { key: 'pixel-scale', label: 'Pixel scale', value: hasScale ? `${fixed(scale, 2)}″/px` : null, source: '206.265 × pixel size (µm) ÷ focal length (mm) — checks.md.' },
    {
      key: 'fov',
      label: 'Field of view',
      value: hasFov ? `${fixed(w, 2)}° × ${fixed(h, 2)}°` : null,
      detail: hasFov ? `${fixed(w * 60, 1)}′ × ${fixed(h * 60, 1)}′` : undefined,
      source: '2·atan(N·p ÷ 2f) per sensor axis — checks.md.',
    },
    { key: 'area', label: 'Sky area', value: hasFov ? `${fixed(skyAreaDeg2(w, h), 2)} deg²` : null, source: 'Solid angle of the rectangular field, 4·asin(sin(a/2)·sin(b/2)).' },
    {
      key: 'download',
      label: 'Download per frame',
      value: hasDownload ? `${fixed(cameraDownloadTimeS(c), 2)} s` : null,
      detail: hasDownload ? linkText : undefined,
      source: '2 bytes × pixels ÷ link rate + 0.3 s (1 byte up to 8 bits) — trade-defaults.md, S7.',
    },
    {
      key: 'guide-scale',
      label: 'Guide pixel scale',
      value: g.present ? (hasGuide ? `${fixed(guideScale, 2)}″/px` : null) : 'No guider',
      source: '206.265 × guide pixel size ÷ guide focal length — checks.md.',
    },
    {
      key: 'dither',
      label: `A ${USUAL_DITHER_PX} px dither`,
      value: g.present ? (hasGuide && hasScale ? `${fixed(ditherMainPxToGuidePx(USUAL_DITHER_PX, scale, guideScale), 1)} guide px` : null) : '—',
      detail: hasScale ? `${fixed(USUAL_DITHER_PX * scale, 1)}″ on the sky` : undefined,
      source: 'Main pixels × main scale ÷ guide scale; 5 px is the usual dither — trade-defaults.md, S13.',
    },
  ];
}
