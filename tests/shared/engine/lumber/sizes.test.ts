import { describe, expect, it } from 'vitest';
import {
  dressedSize,
  sectionProperties,
  LUMBER_SIZES,
} from '../../../../shared/engine/lumber/sizes';

const IN2 = 25.4 ** 2;
const IN3 = 25.4 ** 3;
const IN4 = 25.4 ** 4;

describe('dressed sizes (PS 20 / NDS 2018 Supplement Table 1A, dry)', () => {
  it.each([
    ['2x3', 1.5, 2.5, 64],
    ['2x4', 1.5, 3.5, 89],
    ['2x6', 1.5, 5.5, 140],
    ['2x8', 1.5, 7.25, 184],
    ['2x10', 1.5, 9.25, 235],
    ['2x12', 1.5, 11.25, 286],
  ] as const)('%s is %s × %s in (≈ 38 × %s mm)', (size, b, d, dMm) => {
    const s = dressedSize(size);
    expect(s.thicknessIn).toBe(b);
    expect(s.widthIn).toBe(d);
    expect(s.thickness).toBeWithin(38.1, { rel: 1e-12 });
    // The rounded metric width quoted by CWTA (engineering.md §6).
    expect(Math.round(s.width)).toBe(dMm);
  });

  it('covers every size id', () => {
    expect(LUMBER_SIZES.map((s) => dressedSize(s).nominalWidth)).toEqual([3, 4, 6, 8, 10, 12]);
  });
});

describe('section properties vs NDS 2018 Supplement Table 1B (engineering.md §6, via MST)', () => {
  // Table 1B prints four significant figures.
  it('2x4: A 5.25 in², Sxx 3.063 in³, Ixx 5.359 in⁴, Iyy 0.984 in⁴', () => {
    const p = sectionProperties('2x4');
    expect(p.area / IN2).toBeWithin(5.25, { rel: 1e-9 });
    expect(p.sx / IN3).toBeWithin(3.063, { rel: 5e-4 });
    expect(p.ix / IN4).toBeWithin(5.359, { rel: 5e-4 });
    expect(p.iy / IN4).toBeWithin(0.984, { rel: 5e-4 });
  });

  it('2x6: A 8.25 in², Sxx 7.563 in³, Ixx 20.80 in⁴, Iyy 1.547 in⁴', () => {
    const p = sectionProperties('2x6');
    expect(p.area / IN2).toBeWithin(8.25, { rel: 1e-9 });
    expect(p.sx / IN3).toBeWithin(7.563, { rel: 5e-4 });
    expect(p.ix / IN4).toBeWithin(20.8, { rel: 5e-4 });
    expect(p.iy / IN4).toBeWithin(1.547, { rel: 5e-4 });
  });

  it('plies multiply A, Sx and Ix (pieces side by side)', () => {
    const one = sectionProperties('2x6');
    const two = sectionProperties('2x6', 2);
    expect(two.area).toBeWithin(2 * one.area);
    expect(two.sx).toBeWithin(2 * one.sx);
    expect(two.ix).toBeWithin(2 * one.ix);
    expect(two.iy).toBeWithin(8 * one.iy); // (2b)³ — the weak axis of the glued-together block
  });
});
