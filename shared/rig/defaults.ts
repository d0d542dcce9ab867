/**
 * Starting values for a new rig. Where trade-defaults.md gives a default, its basis is named;
 * the rest are placeholders for a typical 26 MP cooled CMOS camera on a 530 mm refractor
 * (the example rig of checks.md), to be replaced by the user's own numbers.
 */
export const RIG_DEFAULTS = {
  name: 'My rig',
  optics: { focalLengthMm: 530, apertureMm: 106, reducerFactor: 1 },
  camera: {
    sensorWidthPx: 6248,
    sensorHeightPx: 4176,
    pixelSizeUm: 3.76,
    bitDepth: 16,
    link: 'usb3' as const,
    // trade-defaults: largest drop 30 °C (S2); cool/warm rate 3 °C/min (practice; S3).
    cooling: { maxDeltaBelowAmbientC: 30, rateCPerMin: 3 },
    gainPresets: [
      { name: 'Low gain', value: 0 },
      { name: 'High gain', value: 100 },
    ],
    offsetPresets: [{ name: 'Standard', value: 50 }],
    readoutModes: ['Standard'],
  },
  filterWheel: {
    slots: [
      { name: 'L', band: 'L' as const, focusOffsetSteps: 0 },
      { name: 'R', band: 'R' as const, focusOffsetSteps: 0 },
      { name: 'G', band: 'G' as const, focusOffsetSteps: 0 },
      { name: 'B', band: 'B' as const, focusOffsetSteps: 0 },
      { name: 'Ha', band: 'Ha' as const, focusOffsetSteps: 0 },
      { name: 'OIII', band: 'OIII' as const, focusOffsetSteps: 0 },
      { name: 'SII', band: 'SII' as const, focusOffsetSteps: 0 },
    ],
    changeTimeS: 3,
  },
  focuser: { stepSizeUm: 2, backlashSteps: 0, tempCoeffStepsPerC: 0 },
  rotator: { present: false, minDeg: 0, maxDeg: 360, speedDegPerS: 5, skyOffsetDeg: 0 },
  mount: {
    type: 'german-equatorial' as const,
    // trade-defaults: max rate 3.5 °/s, 1 s to full rate, settle 5 s (practice; S9).
    maxSlewRateDegPerS: { axis1: 3.5, axis2: 3.5 },
    accelerationS: 1,
    settleS: 5,
    // trade-defaults: flip 5 min past the meridian (practice; S39).
    meridian: { trackPastMin: 15, flipDelayS: 300 },
    park: { altDeg: 45, azDeg: 0 },
  },
  guider: {
    present: true,
    pixelSizeUm: 3.75,
    focalLengthMm: 200,
    // trade-defaults: settle 1.5 px / 10 s / timeout 60 s (practice; S4); start 2 min (S10, S11).
    settlePx: 1.5,
    settleTimeS: 10,
    settleTimeoutS: 60,
    startS: 120,
  },
};
