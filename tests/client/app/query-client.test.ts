import { describe, expect, it } from 'vitest';
import { signInPathFor } from '../../../src/app/query-client';

describe('signInPathFor', () => {
  it('remembers where the user was', () => {
    expect(signInPathFor({ pathname: '/jobs', search: '?page=2' })).toBe(
      '/sign-in?from=%2Fjobs%3Fpage%3D2',
    );
  });
  it('keeps the plain sign-in path for the landing page and the sign-in page itself', () => {
    expect(signInPathFor({ pathname: '/', search: '' })).toBe('/sign-in');
    expect(signInPathFor({ pathname: '/sign-in', search: '?from=%2Fjobs' })).toBe('/sign-in');
  });
});
