import { describe, expect, it } from 'vitest';
import { FitsHeaderError, headerByteLength, parseFitsHeader, readFitsHeaderBytes } from '@/shared/fits/header';
import { blocks, buildFits, fitsCard, imageCards, type BuildFitsOptions, type TestCard } from '@/tests/helpers/fits';

function rejection(bytes: Uint8Array): FitsHeaderError {
  try {
    parseFitsHeader(bytes);
  } catch (e) {
    if (e instanceof FitsHeaderError) return e;
    throw e;
  }
  throw new Error('expected the header to be rejected');
}

const camera: TestCard[] = imageCards(6248, 4176, [
  { key: 'EXPTIME', value: 300.0, comment: 'seconds' },
  { key: 'OBJECT', value: 'NGC 7000' },
  { key: 'FILTER', value: 'Ha' },
  { key: 'CCD-TEMP', value: -10.2 },
  { key: 'PIERSIDE', value: 'WEST' },
]);

describe('parseFitsHeader (FITS Standard 4.0 §3–4)', () => {
  it('reads a valid one-block header and reports its length in bytes', () => {
    const h = parseFitsHeader(buildFits(camera, { dataBytes: 5760 }));
    expect(h.headerBytes).toBe(2880);
    expect(h.get('SIMPLE')).toBe(true);
    expect(h.get('BITPIX')).toBe(16);
    expect(h.get('NAXIS1')).toBe(6248);
    expect(h.get('exptime')).toBe(300);
    expect(h.get('OBJECT')).toBe('NGC 7000');
    expect(h.get('CCD-TEMP')).toBeCloseTo(-10.2, 12);
    expect(h.get('MISSING')).toBeUndefined();
    expect(h.cards.at(-1)?.keyword).toBe('END');
    expect(h.cards.find((c) => c.keyword === 'EXPTIME')?.comment).toBe('seconds');
  });

  it('reads value kinds: D and E exponents, logical, undefined, complex', () => {
    const h = parseFitsHeader(
      buildFits(
        imageCards(4, 4, [
          { key: 'DEXP', raw: '1.5D3'.padStart(20) },
          { key: 'DEXPNEG', raw: '-2.25D-02'.padStart(20) },
          { key: 'EEXP', raw: '6.02E23'.padStart(20) },
          { key: 'FREEF', raw: '  .5', comment: 'free format' },
          { key: 'FLAG', value: false },
          { key: 'NOVALUE', value: null, comment: 'undefined' },
          { key: 'CPLX', raw: '(1.0, -2.5)'.padStart(20) },
        ]),
      ),
    );
    expect(h.get('DEXP')).toBe(1500);
    expect(h.get('DEXPNEG')).toBeCloseTo(-0.0225, 15);
    expect(h.get('EEXP')).toBeCloseTo(6.02e23, -10);
    expect(h.get('FREEF')).toBe(0.5);
    expect(h.get('FLAG')).toBe(false);
    expect(h.get('NOVALUE')).toBeNull();
    expect(h.cards.find((c) => c.keyword === 'DEXP')?.kind).toBe('float');
    expect(h.cards.find((c) => c.keyword === 'CPLX')?.kind).toBe('complex');
    expect(h.get('CPLX')).toBeUndefined();
  });

  it("reads strings: '' is a quote, trailing blanks drop, leading blanks stay, comments after /", () => {
    const h = parseFitsHeader(
      buildFits(
        imageCards(4, 4, [
          { key: 'OBSERVER', value: "O'Neil" },
          { key: 'QUOTES', raw: "''''", comment: 'one quote' },
          { key: 'EMPTY', raw: "''" },
          { key: 'BLANK', raw: "'      '" },
          { key: 'LEADING', raw: "'  M 31   '" },
          { key: 'SLASHED', raw: "'a/b'", comment: 'slash inside the string' },
        ]),
      ),
    );
    expect(h.get('OBSERVER')).toBe("O'Neil");
    expect(h.get('QUOTES')).toBe("'");
    expect(h.get('EMPTY')).toBe('');
    expect(h.get('BLANK')).toBe(' ');
    expect(h.get('LEADING')).toBe('  M 31');
    expect(h.get('SLASHED')).toBe('a/b');
    expect(h.cards.find((c) => c.keyword === 'SLASHED')?.comment).toBe('slash inside the string');
  });

  it('keeps COMMENT, HISTORY and blank-keyword cards as text without values', () => {
    const h = parseFitsHeader(buildFits(imageCards(4, 4, [{ key: 'COMMENT', comment: ' = not a value' }, { key: 'HISTORY', comment: ' calibrated' }, '        a blank keyword'])));
    const comment = h.cards.find((c) => c.keyword === 'COMMENT');
    expect(comment?.kind).toBe('none');
    expect(comment?.comment).toBe(' = not a value');
    expect(h.get('COMMENT')).toBeUndefined();
    expect(h.cards.find((c) => c.keyword === '')?.comment).toBe('a blank keyword');
  });

  it('joins CONTINUE long strings', () => {
    const h = parseFitsHeader(
      buildFits(imageCards(4, 4, [{ key: 'LONGSTR', raw: "'first part, &'" }, `CONTINUE  'second part &'`, `CONTINUE  'end'`, { key: 'AFTER', value: 1 }])),
    );
    expect(h.get('LONGSTR')).toBe('first part, second part end');
    expect(h.get('AFTER')).toBe(1);
  });

  it('reads headers longer than one block', () => {
    const many: TestCard[] = Array.from({ length: 50 }, (_, i) => ({ key: `KEY${i}`, value: i }));
    const h = parseFitsHeader(buildFits(imageCards(4, 4, many), { dataBytes: 100 }));
    expect(h.headerBytes).toBe(blocks(2));
    expect(h.get('KEY49')).toBe(49);
    expect(h.cards).toHaveLength(5 + 50 + 1);
  });
});

describe('parseFitsHeader rejects broken files with the card number', () => {
  const broken = (options: BuildFitsOptions, cards: TestCard[] = camera) => rejection(buildFits(cards, options));

  it('truncated block', () => {
    const e = broken({ truncateTo: 2000 });
    expect(e.kind).toBe('truncated');
    expect(e.message).toMatch(/block 1 has 2000 of 2880 bytes/);
  });
  it('missing END', () => {
    const e = broken({ dropEnd: true });
    expect(e.kind).toBe('missing-end');
    expect(e.message).toMatch(/No END card/);
  });
  it('missing END with data behind it shows up as non-ASCII data bytes', () => {
    expect(broken({ dropEnd: true, dataBytes: 2880 }).kind).toBe('non-ascii');
  });
  it('non-ASCII byte', () => {
    const e = broken({ nonAscii: { card: 7, column: 15 } });
    expect(e.kind).toBe('non-ascii');
    expect(e.card).toBe(7);
    expect(e.message).toMatch(/Card 7, column 15: byte 0xE9/);
  });
  it('malformed value', () => {
    const e = broken({ badValueAt: 6 });
    expect(e.kind).toBe('malformed-value');
    expect(e.card).toBe(6);
    expect(e.message).toMatch(/Card 6 \(EXPTIME\): "NOT A VALUE"/);
  });
  it('unterminated string and text after a closing quote', () => {
    expect(rejection(buildFits(imageCards(4, 4, [{ key: 'OBJECT', raw: "'M 31" }]))).message).toMatch(/Card 6 \(OBJECT\): the string has no closing quote/);
    expect(rejection(buildFits(imageCards(4, 4, [{ key: 'OBJECT', raw: "'M 31' x" }]))).kind).toBe('malformed-value');
  });
  it('malformed keyword and a file that is not FITS', () => {
    expect(rejection(buildFits(imageCards(4, 4, [{ key: 'exptime', value: 1 }]))).kind).toBe('malformed-keyword');
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0]);
    expect(rejection(png).kind).toBe('not-fits');
  });
});

describe('headerByteLength and readFitsHeaderBytes', () => {
  const file = buildFits(imageCards(4, 4, Array.from({ length: 40 }, (_, i) => ({ key: `K${i}`, value: i }))), { dataBytes: blocks(10) });

  it('asks for more blocks until END is inside the prefix', () => {
    expect(headerByteLength(file.slice(0, blocks(1)))).toBeNull();
    expect(headerByteLength(file.slice(0, blocks(2) - 1))).toBeNull();
    expect(headerByteLength(file.slice(0, blocks(2)))).toBe(blocks(2));
    expect(headerByteLength(file)).toBe(blocks(2));
  });

  it('reads only header slices through a slice reader', async () => {
    const asked: [number, number][] = [];
    const read = async (start: number, end: number) => {
      asked.push([start, end]);
      return file.slice(start, end);
    };
    const header = await readFitsHeaderBytes(read);
    expect(header.length).toBe(blocks(2));
    expect(parseFitsHeader(header).get('K39')).toBe(39);
    expect(asked).toEqual([[0, blocks(4)]]);
  });

  it('returns what it has at end of file so the parser names the fault', async () => {
    const short = buildFits(camera, { dropEnd: true });
    const bytes = await readFitsHeaderBytes(async (s, e) => short.slice(s, e));
    expect(rejection(bytes).kind).toBe('missing-end');
  });

  it('fitsCard writes 80 columns', () => {
    expect(fitsCard({ key: 'A', value: 1 })).toHaveLength(80);
  });
});
