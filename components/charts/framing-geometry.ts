/*
 * Geometry of the framing preview, in arcminutes on the tangent plane at the framing centre,
 * oriented as the sky is drawn: north up, east LEFT. Screen x grows to the west (right), screen
 * y to the south (down). A position angle is measured from north through east, so on screen it
 * turns counter-clockwise: an SVG `rotate(-pa)`.
 */

const RAD = Math.PI / 180;

export type SkyObject = { raDeg: number; decDeg: number; majorArcmin: number; minorArcmin: number | null; positionAngleDeg: number | null };
export type FramingShape = { raDeg: number; decDeg: number; positionAngleDeg: number; mosaicCols: number; mosaicRows: number; overlapPct: number };
export type FieldSize = { widthArcmin: number; heightArcmin: number };
export type Point = { x: number; y: number };

/**
 * Standard coordinates (ξ east, η north) of a position on the plane tangent at (α0, δ0): the
 * gnomonic projection (Calabretta & Greisen 2002, A&A 395, 1077, "TAN"), here in arcminutes and
 * turned to screen axes (x = −ξ, y = −η).
 */
export function tangentOffsetArcmin(raDeg: number, decDeg: number, ra0Deg: number, dec0Deg: number): Point {
  const d = decDeg * RAD;
  const d0 = dec0Deg * RAD;
  const dRa = (raDeg - ra0Deg) * RAD;
  const cosC = Math.sin(d0) * Math.sin(d) + Math.cos(d0) * Math.cos(d) * Math.cos(dRa);
  if (cosC <= 0) return { x: 0, y: 0 }; // on the far side: not drawable, keep it centred
  const xi = (Math.cos(d) * Math.sin(dRa)) / cosC;
  const eta = (Math.cos(d0) * Math.sin(d) - Math.sin(d0) * Math.cos(d) * Math.cos(dRa)) / cosC;
  return { x: (-xi / RAD) * 60, y: (-eta / RAD) * 60 };
}

/** Panel centres of a cols × rows mosaic in the camera frame (before rotation), row 0 on top. */
export function mosaicPanelCentres(cols: number, rows: number, overlapPct: number, field: FieldSize): Point[] {
  const stepX = field.widthArcmin * (1 - overlapPct / 100);
  const stepY = field.heightArcmin * (1 - overlapPct / 100);
  const out: Point[] = [];
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < cols; i++) out.push({ x: (i - (cols - 1) / 2) * stepX, y: (j - (rows - 1) / 2) * stepY });
  }
  return out;
}

/** Outer size of the whole mosaic in the camera frame. */
export function mosaicSizeArcmin(cols: number, rows: number, overlapPct: number, field: FieldSize): FieldSize {
  const keep = 1 - overlapPct / 100;
  return { widthArcmin: field.widthArcmin * (1 + (cols - 1) * keep), heightArcmin: field.heightArcmin * (1 + (rows - 1) * keep) };
}

/** A point of the camera frame turned onto the screen by the position angle (counter-clockwise). */
export function rotateByPa(p: Point, paDeg: number): Point {
  const a = -paDeg * RAD;
  return { x: p.x * Math.cos(a) - p.y * Math.sin(a), y: p.x * Math.sin(a) + p.y * Math.cos(a) };
}

const NICE_ARCMIN = [0.5, 1, 2, 5, 10, 15, 20, 30, 45, 60, 90, 120, 180, 240, 300, 600];

/** The longest round length that fits in `maxArcmin`, for the scale bar. */
export function scaleBarArcmin(maxArcmin: number): number {
  let best = NICE_ARCMIN[0]!;
  for (const v of NICE_ARCMIN) if (v <= maxArcmin) best = v;
  return best;
}

/** "20′", "1°", "1.5°". */
export function formatArcmin(arcmin: number): string {
  if (arcmin >= 60) return `${Number((arcmin / 60).toFixed(2))}°`;
  return `${Number(arcmin.toFixed(1))}′`;
}

export type FramingLayout = {
  /** Half the side of the square view, arcmin. */
  halfViewArcmin: number;
  object: Point;
  panels: Point[];
  mosaic: FieldSize;
};

/** Everything the preview draws, and a view large enough for the mosaic and the object with a margin. */
export function framingLayout(obj: SkyObject, framing: FramingShape, field: FieldSize): FramingLayout {
  const object = tangentOffsetArcmin(obj.raDeg, obj.decDeg, framing.raDeg, framing.decDeg);
  const mosaic = mosaicSizeArcmin(framing.mosaicCols, framing.mosaicRows, framing.overlapPct, field);
  const corners = [
    { x: -mosaic.widthArcmin / 2, y: -mosaic.heightArcmin / 2 },
    { x: mosaic.widthArcmin / 2, y: -mosaic.heightArcmin / 2 },
    { x: mosaic.widthArcmin / 2, y: mosaic.heightArcmin / 2 },
    { x: -mosaic.widthArcmin / 2, y: mosaic.heightArcmin / 2 },
  ].map((p) => rotateByPa(p, framing.positionAngleDeg));
  const objectReach = Math.max(Math.abs(object.x), Math.abs(object.y)) + obj.majorArcmin / 2;
  const reach = Math.max(objectReach, ...corners.map((p) => Math.max(Math.abs(p.x), Math.abs(p.y))));
  return {
    halfViewArcmin: Math.max(3, reach * 1.15),
    object,
    panels: mosaicPanelCentres(framing.mosaicCols, framing.mosaicRows, framing.overlapPct, field),
    mosaic,
  };
}
