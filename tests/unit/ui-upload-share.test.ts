import { describe, expect, it } from 'vitest';
import { uploadShare } from '@/components/ui/upload-share';

describe('uploadShare', () => {
  it('is not started before the first bytes go (the size may still be a placeholder)', () => {
    expect(uploadShare(null)).toEqual({ fraction: 0, loadedBytes: 0, totalBytes: 1, started: false, sent: false });
    expect(uploadShare({ loadedBytes: 0, totalBytes: 1 })).toMatchObject({ started: false, sent: false });
  });

  it('follows the bytes, and is sent once all went', () => {
    expect(uploadShare({ loadedBytes: 36_000, totalBytes: 72_000 })).toEqual({ fraction: 0.5, loadedBytes: 36_000, totalBytes: 72_000, started: true, sent: false });
    expect(uploadShare({ loadedBytes: 72_000, totalBytes: 72_000 })).toMatchObject({ fraction: 1, sent: true });
    // never more than all of it
    expect(uploadShare({ loadedBytes: 80_000, totalBytes: 72_000 })).toMatchObject({ fraction: 1, loadedBytes: 72_000, sent: true });
  });
});
