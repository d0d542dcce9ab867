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
} as const;
