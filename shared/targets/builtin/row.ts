import { parseDec, parseRa } from '@/shared/targets/coordinates';
import type { CatalogueObject, TargetKind } from '@/shared/targets/schema';

/*
 * The built-in list is written as compact rows with sexagesimal J2000 coordinates, as published
 * values are usually quoted, and turned into catalogue objects once at load time.
 */

/** designation, aliases, common name, kind, RA "HH:MM:SS", Dec "±DD:MM:SS", major ′, minor ′, PA °, mag. */
export type BuiltinRow = readonly [
  designation: string,
  aliases: readonly string[],
  name: string,
  type: TargetKind,
  ra: string,
  dec: string,
  majorArcmin: number,
  minorArcmin: number | null,
  positionAngleDeg: number | null,
  magnitude: number | null,
];

/** A row → a catalogue object; throws on an unreadable coordinate (a mistake in the list itself). */
export function fromRow(row: BuiltinRow): CatalogueObject {
  const [designation, aliases, name, type, ra, dec, majorArcmin, minorArcmin, positionAngleDeg, magnitude] = row;
  const raDeg = parseRa(ra);
  const decDeg = parseDec(dec);
  if (!raDeg.ok) throw new Error(`${designation}: ${raDeg.error}`);
  if (!decDeg.ok) throw new Error(`${designation}: ${decDeg.error}`);
  return { designation, aliases: [...aliases], name, type, raDeg: raDeg.valueDeg, decDeg: decDeg.valueDeg, majorArcmin, minorArcmin, positionAngleDeg, magnitude };
}
