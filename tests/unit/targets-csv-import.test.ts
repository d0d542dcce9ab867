/*
 * Catalogue CSV import. Inline fixtures are written for these tests (values are commonly
 * published positions, not rows of any catalogue file). The last block reads OpenNGC by Mattia
 * Verga (github.com/mattiaverga/OpenNGC, CC-BY-SA-4.0) at run time from ../shared/data/openngc/;
 * nothing from it is copied into the repository.
 */
import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import { detectCsvLayout, parseCatalogueCsv, type CsvMapping } from '@/shared/targets/csv-import';
import { OPENNGC_ADDENDUM_CSV, OPENNGC_NGC_CSV, openNgcAvailable, openNgcSuite } from '@/tests/helpers/openngc';

const GENERIC = [
  'Designation,Common name,Type,RA,Dec,Size,Mag,Aliases',
  'M42,Orion Nebula,emission-nebula,05:35:17.3,-05:23:28,85,4.0,NGC 1976',
  '"ngc7000","North America Nebula, Cygnus",HII,20h59m17s,+44°31′44″,120,4,',
  'M31,"Andromeda ""Great"" Galaxy",galaxy,00 42 44.3,+41 16 09,190,3.4,"NGC0224|ngc 221"',
].join('\n');

function parse(text: string, patch: Partial<CsvMapping> = {}) {
  const layout = detectCsvLayout(text);
  return parseCatalogueCsv(text, { ...layout.mapping, ...patch });
}

describe('detectCsvLayout', () => {
  it('guesses the delimiter and the mapping of a generic CSV from its header', () => {
    const layout = detectCsvLayout(GENERIC);
    expect(layout.headers).toEqual(['Designation', 'Common name', 'Type', 'RA', 'Dec', 'Size', 'Mag', 'Aliases']);
    expect(layout.mapping).toEqual({
      layout: 'generic',
      delimiter: ',',
      bareRaUnit: 'degrees',
      columns: { designation: 'Designation', name: 'Common name', type: 'Type', ra: 'RA', dec: 'Dec', majorArcmin: 'Size', magnitude: 'Mag', aliases: 'Aliases' },
    });
  });

  it('recognises semicolons and tabs, quoted headers, a BOM, and a name column as the designation', () => {
    expect(detectCsvLayout('\uFEFFname;ra_deg;dec_deg\nM1;83.63;22.01').mapping).toMatchObject({ delimiter: ';', columns: { designation: 'name', ra: 'ra_deg', dec: 'dec_deg' } });
    expect(detectCsvLayout('id\t"RA (h)"\tDE\tV\nM1\t5.576\t22.01\t8.4').mapping).toMatchObject({ delimiter: '\t', bareRaUnit: 'hours', columns: { designation: 'id', ra: 'RA (h)', dec: 'DE', magnitude: 'V' } });
  });

  it("recognises OpenNGC's semicolon layout by its header", () => {
    const header = 'Name;Type;RA;Dec;Const;MajAx;MinAx;PosAng;B-Mag;V-Mag;J-Mag;H-Mag;K-Mag;SurfBr;Hubble;Pax;Pm-RA;Pm-Dec;RadVel;Redshift;Cstar U-Mag;Cstar B-Mag;Cstar V-Mag;M;NGC;IC;Cstar Names;Identifiers;Common names;NED notes;OpenNGC notes;Sources';
    expect(detectCsvLayout(`${header}\n`).mapping.layout).toBe('openngc');
    expect(detectCsvLayout(header.replace(/;/g, ',')).mapping.layout).toBe('generic');
  });
});

describe('parseCatalogueCsv, generic layout', () => {
  it('reads every field, normalises designations and aliases, keeps quoted commas and quotes', () => {
    const { rows, errors, skipped } = parse(GENERIC);
    expect(errors).toEqual([]);
    expect(skipped).toEqual({ duplicate: 0, nonexistent: 0 });
    expect(rows.map((r) => r.designation)).toEqual(['M42', 'NGC 7000', 'M31']);
    expect(rows[1]).toMatchObject({ name: 'North America Nebula, Cygnus', type: 'emission-nebula', majorArcmin: 120, aliases: [] });
    expect(rows[1]?.raDeg).toBeCloseTo((20 + 59 / 60 + 17 / 3600) * 15, 9);
    expect(rows[1]?.decDeg).toBeCloseTo(44 + 31 / 60 + 44 / 3600, 9);
    expect(rows[2]).toMatchObject({ name: 'Andromeda "Great" Galaxy', aliases: ['NGC 224', 'NGC 221'], magnitude: 3.4, minorArcmin: null });
  });

  it('reads bare RA numbers as degrees or hours as the mapping says', () => {
    const text = 'id,ra,dec\nM1,83.633,22.0145';
    expect(parse(text).rows[0]?.raDeg).toBeCloseTo(83.633, 9);
    expect(parse('id,ra,dec\nM1,5.5755,22.0145', { bareRaUnit: 'hours' }).rows[0]?.raDeg).toBeCloseTo(83.6325, 9);
    expect(parse('id,ra,dec\nM1,25,22', { bareRaUnit: 'hours' }).errors).toEqual([{ line: 2, message: 'Right ascension must be below 24h' }]);
  });

  it('reports every error kind with the line it starts on, and keeps the good rows', () => {
    const text = [
      'id,ra,dec,major,minor,pa,mag', //                      line 1
      'M1,05:34:31.9,+22:00:52,6,4,,8.4', //                  line 2: fine
      'M2,25:00:00,-00:49:24,16,,,6.5', //                    line 3: RA hours
      'M3,13:42:11.6,+95:00:00,18,,,6.2', //                  line 4: Dec out of range
      ',13:42:11.6,+28:22:38,18,,,6.2', //                    line 5: no designation
      'M 1,05:34:31.9,+22:00:52,6,4,,8.4', //                 line 6: duplicate of line 2
      'M5,15:18:33.2,+02:04:52,big,,,5.6', //                 line 7: not a number
      'M6,17:40:20,-32:15:15,25,30,,4.2', //                  line 8: minor > major
      'M7,17:53:54,-34:48:00,80,,400,3.3', //                 line 9: PA out of range
      '', //                                                  line 10: blank, skipped
      'M8,18:03:37,,90,40,,6.0', //                           line 11: no Dec
      'M9,17:19:11.8,-18:30:59,12,,,77', //                   line 12: magnitude out of range
      'M10,16h57m,-04:05:58', //                              line 13: short record is fine
    ].join('\r\n');
    const { rows, errors } = parse(text);
    expect(rows.map((r) => r.designation)).toEqual(['M1', 'M10']);
    expect(errors).toEqual([
      { line: 3, message: 'Right ascension hours must be below 24' },
      { line: 4, message: 'Declination must be between −90° and +90°' },
      { line: 5, message: 'Missing designation' },
      { line: 6, message: 'Designation M1 already appears on line 2' },
      { line: 7, message: 'Major axis "big" is not a number' },
      { line: 8, message: 'M6: Minor axis must not exceed the major axis' },
      { line: 9, message: 'M7: Position angle must be at most 360°' },
      { line: 11, message: 'Missing declination' },
      { line: 12, message: 'M9: Magnitude must be at most 30' },
    ]);
  });

  it('counts lines inside quoted fields and reports a quote that never closes', () => {
    const text = 'id,name,ra,dec\nM1,"Crab\nNebula",05:34:31.9,+22:00:52\nM2,,99:00:00,0\nM3,"open,13:42:11.6,+28:22:38';
    const { rows, errors } = parse(text);
    expect(rows[0]?.name).toBe('Crab\nNebula');
    expect(errors).toEqual([
      { line: 5, message: 'A quoted field is never closed' },
      { line: 4, message: 'Right ascension hours must be below 24' },
      { line: 5, message: 'Missing right ascension; Missing declination' },
    ]);
  });

  it('refuses a mapping without required columns or with columns the file lacks, and an empty file', () => {
    expect(parse('name,size\nM1,6').errors).toEqual([{ line: 1, message: 'Choose a column for ra, dec' }]);
    expect(parse('id,ra,dec\nM1,1,1', { columns: { designation: 'id', ra: 'ra', dec: 'DEC2000' } }).errors).toEqual([{ line: 1, message: 'The file has no column "DEC2000"' }]);
    expect(parse('').errors).toEqual([{ line: 1, message: 'The file is empty' }]);
  });
});

describe('parseCatalogueCsv, OpenNGC layout (inline fixture)', () => {
  const header = 'Name;Type;RA;Dec;Const;MajAx;MinAx;PosAng;B-Mag;V-Mag;M;NGC;IC;Identifiers;Common names;OpenNGC notes';
  const text = [
    header,
    'NGC0224;G;00:42:44.3;+41:16:09;And;190.00;60.00;35;4.4;3.4;031;;;PGC 2557;Andromeda Galaxy,Andromeda Nebula;',
    'NGC0281;HII;00:52:59.3;+56:37:19;Cas;35.00;30.00;;;;;;0011;;Pacman Nebula;',
    'IC0011;Dup;00:52:59.3;+56:37:19;Cas;;;;;;;0281;;;;',
    'IC0067;NonEx;01:00:00;-07:00:00;Cet;;;;;;;;;;;"Listed; nothing; there"',
    'NGC7000;Neb;20:59:17.1;+44:31:44;Cyg;120.00;100.00;;;;;;;;North America Nebula;',
    'NGC9999;Quasar;00:00:00;+00:00:00;Psc;;;;;;;;;;;',
    'NGC6543;PN;17:58:33.4;+66:37:59;Dra;0.40;0.30;;8.8;;;;;;;',
  ].join('\n');

  it('maps names, types, Messier numbers, cross-ids and common names, and skips Dup and NonEx rows', () => {
    const { rows, errors, skipped } = parse(text);
    expect(skipped).toEqual({ duplicate: 1, nonexistent: 1 });
    expect(errors).toEqual([{ line: 7, message: 'Unknown OpenNGC type "Quasar"' }]);
    expect(rows.map((r) => r.designation)).toEqual(['NGC 224', 'NGC 281', 'NGC 7000', 'NGC 6543']);
    expect(rows[0]).toMatchObject({ aliases: ['M31', 'Andromeda Nebula'], name: 'Andromeda Galaxy', type: 'galaxy', majorArcmin: 190, minorArcmin: 60, positionAngleDeg: 35, magnitude: 3.4 });
    expect(rows[1]).toMatchObject({ aliases: ['IC 11'], type: 'emission-nebula', magnitude: null });
    expect(rows[2]?.type).toBe('other');
    expect(rows[3]?.magnitude).toBe(8.8);
  });
});

describe.skipIf(!openNgcAvailable)(openNgcSuite('parseCatalogueCsv on the real OpenNGC files'), () => {
  it('imports NGC.csv with plausible counts and no row errors', () => {
    const text = fs.readFileSync(OPENNGC_NGC_CSV, 'utf8');
    const layout = detectCsvLayout(text);
    expect(layout.mapping.layout).toBe('openngc');
    const { rows, errors, skipped } = parseCatalogueCsv(text, layout.mapping);
    // No row of this OpenNGC version fails our schema; a new version that adds one shows up here.
    expect(errors).toEqual([]);
    expect(rows.length).toBeGreaterThan(12_000);
    expect(skipped.duplicate).toBeGreaterThan(500);
    expect(skipped.nonexistent).toBeGreaterThan(0);
    const byDesignation = new Map(rows.map((r) => [r.designation, r]));
    expect(byDesignation.get('NGC 7000')?.name).toContain('North America');
    expect(byDesignation.get('NGC 224')?.aliases).toContain('M31');
    expect(byDesignation.get('IC 434')?.type).toBe('emission-nebula');
    expect(new Set(rows.map((r) => r.type)).size).toBeGreaterThan(8);
  });

  it('imports addendum.csv, where M40 and M45 live', () => {
    const text = fs.readFileSync(OPENNGC_ADDENDUM_CSV, 'utf8');
    const { rows, errors } = parseCatalogueCsv(text, detectCsvLayout(text).mapping);
    expect(errors).toEqual([]);
    expect(rows.find((r) => r.designation === 'M40')?.type).toBe('double-star');
    expect(rows.find((r) => r.aliases.includes('M45'))?.designation).toBe('Mel 22');
  });
});
