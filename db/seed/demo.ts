/**
 * The demo scenario loaded by `npm start` (never by tests): an invented club with an owner
 * (also the site administrator) and a member, and a field site with plausible coordinates.
 * Passwords are documented in README.md; they are for a local demo only.
 */
export const DEMO_CLUB = { name: 'Quarry Hill Imaging Circle', slug: 'quarry-hill' } as const;

export const DEMO_USERS = [
  { name: 'Ines Varga', email: 'ines@quarryhill.example', password: 'loom-owner-2026', siteRole: 'admin', clubRole: 'owner' },
  { name: 'Tomas Brel', email: 'tomas@quarryhill.example', password: 'loom-member-2026', siteRole: 'user', clubRole: 'member' },
] as const;

/** Invented dark-sky field on a plateau; coordinates are plausible, not a real observatory. */
export const DEMO_SITE = {
  name: 'Larchfold Meadow',
  latitudeDeg: 46.9312,
  longitudeDeg: 7.6158,
  elevationM: 872,
  timeZone: 'Europe/Zurich',
  isDefault: true,
  minAltitudeDeg: 28,
  duskTempC: 4,
  dawnTempC: -1,
  // A spruce stand to the north-east and a barn roof to the south-west (invented).
  horizon: [
    { azDeg: 0, altDeg: 12 },
    { azDeg: 30, altDeg: 22 },
    { azDeg: 60, altDeg: 25 },
    { azDeg: 90, altDeg: 14 },
    { azDeg: 150, altDeg: 6 },
    { azDeg: 210, altDeg: 8 },
    { azDeg: 230, altDeg: 31 },
    { azDeg: 250, altDeg: 31 },
    { azDeg: 270, altDeg: 9 },
    { azDeg: 330, altDeg: 10 },
  ],
};

/** A plausible portable rig: 106 mm f/5 refractor, 26 MP cooled CMOS camera, 7-slot wheel, rotator. */
export const DEMO_RIG = {
  name: 'Meadow refractor',
  optics: { focalLengthMm: 530, apertureMm: 106, reducerFactor: 1 },
  camera: { sensorWidthPx: 6248, sensorHeightPx: 4176, pixelSizeUm: 3.76, bitDepth: 16, link: 'usb3' },
  filterWheel: {
    slots: [
      { name: 'L', band: 'L', focusOffsetSteps: 0 },
      { name: 'R', band: 'R', focusOffsetSteps: 12 },
      { name: 'G', band: 'G', focusOffsetSteps: 8 },
      { name: 'B', band: 'B', focusOffsetSteps: 20 },
      { name: 'Ha 3nm', band: 'Ha', focusOffsetSteps: -35 },
      { name: 'OIII 3nm', band: 'OIII', focusOffsetSteps: -28 },
      { name: 'SII 3nm', band: 'SII', focusOffsetSteps: -40 },
    ],
    changeTimeS: 3,
  },
  rotator: { present: true, minDeg: 0, maxDeg: 360, speedDegPerS: 5, skyOffsetDeg: 0 },
} as const;

/** Targets with a framing each (published J2000 positions of real objects). */
export const DEMO_TARGETS = [
  { designation: 'M31', framing: { name: 'Core and both companions', raDeg: 10.6847, decDeg: 41.2689, positionAngleDeg: 35 } },
  { designation: 'NGC 7000', framing: { name: 'Cygnus wall', raDeg: 314.75, decDeg: 44.33, positionAngleDeg: 90 } },
  { designation: 'M42', framing: { name: 'Sword, landscape', raDeg: 83.822, decDeg: -5.391, positionAngleDeg: 0 } },
] as const;
