import { describe, expect, it } from 'vitest';
import { checkBearing } from '../../../../shared/engine/members';
import { LB_N } from './helpers';

describe('bearing perpendicular to grain (NDS 2018 3.10.2, 3.10.4)', () => {
  it('2x4 SPF No.1/No.2 on 3.5 in at a heel: capacity 425 psi × 5.25 in² = 2,231 lb (Table 4A Fc⊥)', () => {
    const r = checkBearing({
      lumberId: '2x4 SPF-1/2',
      plies: 1,
      reaction: 2231.25 * LB_N,
      bearingLength: 3.5 * 25.4,
    });
    expect(r.cb).toBe(1);
    expect(r.ratio).toBeWithin(1, { rel: 1e-9 });
  });

  it('interior bearing of 1.5 in takes Cb = 1.25 and two plies double the area', () => {
    const one = checkBearing({
      lumberId: '2x4 SPF-1/2',
      plies: 1,
      reaction: 1000,
      bearingLength: 38.1,
      distanceFromEnd: 200,
    });
    const two = checkBearing({
      lumberId: '2x4 SPF-1/2',
      plies: 2,
      reaction: 1000,
      bearingLength: 38.1,
      distanceFromEnd: 200,
    });
    expect(one.cb).toBeWithin(1.25);
    expect(two.ratio).toBeWithin(one.ratio / 2);
  });
});
