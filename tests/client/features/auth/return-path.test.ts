import { describe, expect, it } from 'vitest';
import { safeReturnPath } from '../../../../src/features/auth/return-path';

describe('safeReturnPath', () => {
  it('follows same-site paths only (no open redirect, common practice)', () => {
    expect(safeReturnPath('/jobs?page=2')).toBe('/jobs?page=2');
    expect(safeReturnPath('//evil.example')).toBe('/');
    expect(safeReturnPath('https://evil.example')).toBe('/');
    expect(safeReturnPath(null)).toBe('/');
    expect(safeReturnPath('/sign-in')).toBe('/');
  });
});
