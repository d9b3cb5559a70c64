import { describe, expect, it } from 'vitest';
import { existsSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { testApp } from '../../../support/db';
import { sweepPartialUploads, uploadTempDir } from '../../../../server/services/storage';
import { useTempUploadDir } from './fixtures';

useTempUploadDir();

/** A half-written upload in the temp folder, last written `ageMs` ago. */
function partial(name: string, ageMs: number) {
  const path = join(uploadTempDir(), name);
  writeFileSync(path, 'half a plan');
  const when = new Date(Date.now() - ageMs);
  utimesSync(path, when, when);
  return path;
}

describe('partial uploads left by a killed process', () => {
  it('are swept when an app starts; a recent one (another server may be receiving it) stays', async () => {
    const stale = partial('0b6f8f9e-0000-4000-8000-000000000001.part', 3 * 60 * 60 * 1000);
    const fresh = partial('0b6f8f9e-0000-4000-8000-000000000002.part', 1000);
    const other = partial('notes.txt', 3 * 60 * 60 * 1000);
    testApp();
    await expect.poll(() => existsSync(stale)).toBe(false);
    expect(existsSync(fresh)).toBe(true);
    expect(existsSync(other)).toBe(true);
    expect(await sweepPartialUploads(0)).toEqual(['0b6f8f9e-0000-4000-8000-000000000002.part']);
  });
});
