import { describe, expect, it } from 'vitest';
import { jointLabel } from '../../../../shared/engine/profiles/labels';

describe('jointLabel', () => {
  it('counts A … Z, AA … ZZ, AAA like spreadsheet columns', () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(jointLabel)).toEqual([
      'A',
      'B',
      'Z',
      'AA',
      'AB',
      'AZ',
      'BA',
      'ZZ',
      'AAA',
    ]);
  });
});
