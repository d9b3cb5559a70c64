import { describe, expect, it } from 'vitest';
import { psfFirst } from '../../../../shared/engine/design/present';

describe('imperial notes lead with psf', () => {
  it('swaps "kPa (psf)" pairs and leaves other text alone', () => {
    expect(psfFirst('Roof snow ps = 0.958 kPa (20.0 psf) from the ground snow load.')).toBe(
      'Roof snow ps = 20.0 psf (0.958 kPa) from the ground snow load.',
    );
    expect(psfFirst('No loads here, 12 kN.')).toBe('No loads here, 12 kN.');
  });
});
