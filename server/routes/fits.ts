import express, { Router } from 'express';
import { HttpError } from '@/server/errors';
import { frameFromHeader } from '@/shared/fits/frame';
import { FitsHeaderError, parseFitsHeader } from '@/shared/fits/header';
import { wcsFromHeader } from '@/shared/fits/wcs';

/**
 * POST /api/fits/framing: the header blocks of a FITS file (the client sends only those, read
 * with file slices) → the framing its WCS describes and the camera keywords. Nothing is stored.
 */
export function fitsRouter(): Router {
  const r = Router();
  r.post('/framing', express.raw({ type: ['application/octet-stream', 'application/fits', 'image/fits'], limit: '2mb' }), (req, res) => {
    if (!Buffer.isBuffer(req.body) || req.body.length === 0) throw new HttpError(415, 'unsupported-media-type', 'Send the FITS header bytes as application/octet-stream');
    let header;
    try {
      header = parseFitsHeader(new Uint8Array(req.body.buffer, req.body.byteOffset, req.body.byteLength));
    } catch (err) {
      if (err instanceof FitsHeaderError) throw new HttpError(400, 'invalid-fits', err.message, { kind: err.kind });
      throw err;
    }
    const wcs = wcsFromHeader(header);
    const frame = frameFromHeader(header);
    if (!wcs || !wcs.centre) {
      throw new HttpError(422, 'no-wcs', 'This file has no plate solution (no WCS keywords): solve it first, or enter the framing by hand', { frame });
    }
    res.json({
      framing: {
        raDeg: wcs.centre.raDeg,
        decDeg: wcs.centre.decDeg,
        positionAngleDeg: wcs.positionAngleDeg,
        pixelScaleArcsecPerPx: wcs.pixelScaleArcsecPerPx,
        mirrored: wcs.mirrored,
      },
      frame,
    });
  });
  return r;
}
