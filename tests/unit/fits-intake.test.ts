import { describe, expect, it } from 'vitest';
import { intakeName, isFitsName, mapLimited, prepareIntake, readIntakeHeader, splitFitsFiles, toBase64, type IntakeSource } from '@/lib/fits-intake';
import { blocks, cameraFrame } from '@/tests/helpers/fits';

/** A picked file over bytes that records every slice read, like `File.slice().arrayBuffer()`. */
function fakeFile(name: string, bytes: Uint8Array, relativePath = ''): IntakeSource & { reads: [number, number][] } {
  const reads: [number, number][] = [];
  return {
    name,
    size: bytes.length,
    webkitRelativePath: relativePath,
    reads,
    slice(start = 0, end = bytes.length) {
      reads.push([start, end]);
      const part = bytes.slice(start, end);
      return { arrayBuffer: async () => part.buffer.slice(part.byteOffset, part.byteOffset + part.byteLength) as ArrayBuffer };
    },
  };
}

const ascii = (text: string) => Uint8Array.from(text, (ch) => ch.charCodeAt(0));
const fromBase64 = (b64: string) => new Uint8Array(Buffer.from(b64, 'base64'));

describe('toBase64', () => {
  it('matches the test vectors of RFC 4648 §10', () => {
    const vectors: [string, string][] = [
      ['', ''],
      ['f', 'Zg=='],
      ['fo', 'Zm8='],
      ['foo', 'Zm9v'],
      ['foob', 'Zm9vYg=='],
      ['fooba', 'Zm9vYmE='],
      ['foobar', 'Zm9vYmFy'],
    ];
    for (const [text, encoded] of vectors) expect(toBase64(ascii(text))).toBe(encoded);
  });

  it('encodes every byte value as Node does (bytes 0..255, then a FITS block)', () => {
    const all = Uint8Array.from({ length: 256 }, (_, i) => i);
    expect(toBase64(all)).toBe(Buffer.from(all).toString('base64'));
    const frame = cameraFrame({ type: 'Light Frame', dateObs: '2025-10-12T21:00:00', exposureS: 300 });
    expect(toBase64(frame)).toBe(Buffer.from(frame).toString('base64'));
  });
});

describe('file choice', () => {
  it('takes .fits, .fit and .fts in any case and skips the rest of a folder', () => {
    expect(['a.fits', 'b.FIT', 'c.fts', 'd.Fits'].every(isFitsName)).toBe(true);
    expect(['notes.txt', 'preview.jpg', 'a.fits.xml', 'fits'].some(isFitsName)).toBe(false);
    const files = ['L_001.fits', 'L_002.fit', 'thumbs.db', 'log.txt', 'D_001.fts'].map((name) => ({ name }));
    const { fits, skipped } = splitFitsFiles(files);
    expect(fits.map((f) => f.name)).toEqual(['L_001.fits', 'L_002.fit', 'D_001.fts']);
    expect(skipped).toBe(2);
  });

  it('names a file by its path inside the folder, keeping the end of very long paths', () => {
    expect(intakeName({ name: 'L_001.fits', webkitRelativePath: 'night1/lights/L_001.fits' })).toBe('night1/lights/L_001.fits');
    expect(intakeName({ name: 'L_001.fits', webkitRelativePath: '' })).toBe('L_001.fits');
    const long = intakeName({ name: 'x.fits', webkitRelativePath: `${'deep/'.repeat(80)}x.fits` });
    expect(long.length).toBe(260);
    expect(long.endsWith('/x.fits')).toBe(true);
  });
});

describe('mapLimited', () => {
  it('keeps the order of the items, never runs more than the limit at once and counts each one done', async () => {
    let running = 0;
    let most = 0;
    const counts: number[] = [];
    const out = await mapLimited(
      [50, 10, 30, 0, 20, 5, 40],
      3,
      async (ms, i) => {
        running++;
        most = Math.max(most, running);
        await new Promise((r) => setTimeout(r, ms));
        running--;
        return i * 10;
      },
      (done) => counts.push(done),
    );
    expect(out).toEqual([0, 10, 20, 30, 40, 50, 60]);
    expect(most).toBe(3);
    expect(counts).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });

  it('returns an empty list for no items', async () => {
    expect(await mapLimited([], 4, async () => 1)).toEqual([]);
  });
});

describe('readIntakeHeader', () => {
  it('reads only the header blocks of a large frame, never its data', async () => {
    const frame = cameraFrame({ type: 'Light Frame', dateObs: '2025-10-12T21:00:00', exposureS: 300, filter: 'Ha' }, { dataBytes: 600_000 });
    const file = fakeFile('L.fits', frame);
    const header = await readIntakeHeader(file);
    expect(header.length).toBe(blocks(1));
    expect(Array.from(header)).toEqual(Array.from(frame.slice(0, blocks(1))));
    // readFitsHeaderBytes asks for 4 blocks at a time: one request here, nowhere near the 600 kB.
    expect(Math.max(...file.reads.map(([, end]) => end))).toBeLessThanOrEqual(blocks(4));
  });

  it('sends the first block of a file that is not FITS, so the server can name the fault', async () => {
    const text = ascii('This is a text file that ends in .fits by mistake.\n'.repeat(200));
    const header = await readIntakeHeader(fakeFile('notes.fits', text));
    expect(header.length).toBe(blocks(1));
    expect(Array.from(header)).toEqual(Array.from(text.slice(0, blocks(1))));
  });

  it('sends what there is of a truncated header', async () => {
    const truncated = cameraFrame({ type: 'Dark Frame', dateObs: '2025-10-12T21:00:00', exposureS: 300 }, { truncateTo: 1000 });
    const header = await readIntakeHeader(fakeFile('broken.fits', truncated));
    expect(header.length).toBe(1000);
  });
});

describe('prepareIntake', () => {
  it('reads every file, refuses empty ones here and reports progress', async () => {
    const light = cameraFrame({ type: 'Light Frame', dateObs: '2025-10-12T21:00:00', exposureS: 300 }, { dataBytes: 10_000 });
    const files = [fakeFile('a.fits', light, 'n1/a.fits'), fakeFile('empty.fits', new Uint8Array(0)), fakeFile('b.fits', light)];
    const seen: number[] = [];
    const { files: out, localRejects } = await prepareIntake(files, (done) => seen.push(done));
    expect(out.map((f) => f.name)).toEqual(['n1/a.fits', 'b.fits']);
    expect(Array.from(fromBase64(out[0]!.headerBase64))).toEqual(Array.from(light.slice(0, blocks(1))));
    expect(localRejects).toEqual([{ name: 'empty.fits', reason: 'The file is empty', kind: 'empty' }]);
    expect(seen).toEqual([1, 2, 3]);
  });
});
