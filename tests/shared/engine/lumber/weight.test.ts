import { describe, expect, it } from 'vitest';
import {
  lumberDensityKgM3,
  lumberMassKg,
  SHIPPING_MOISTURE_CONTENT,
  specificGravity,
} from '../../../../shared/engine/lumber';
import { mm } from '../../../../shared/engine/units';

describe('estimated lumber weight', () => {
  it('uses the NDS 2018 Table 12.3.3A specific gravity of the species group', () => {
    // G (oven-dry weight and volume): SPF 0.42, DF-L 0.50, SP 0.55 — NDS 2018 Table 12.3.3A (from memory).
    expect(specificGravity('2x4 SPF-1/2')).toBe(0.42);
    expect(specificGravity('2x4 SP-2')).toBe(0.55);
    expect(specificGravity('2x6 DFL-2')).toBe(0.5);
    expect(specificGravity('2x4 MSR-2100-1.8E')).toBe(0.42); // MSR assumed SPF stock
  });

  it('is lumber at 19 % moisture, the ceiling of dry (S-DRY, KD-19) lumber', () => {
    // Dry lumber: MC ≤ 19 % — American Softwood Lumber Standard DOC PS 20 (from memory).
    expect(SHIPPING_MOISTURE_CONTENT).toBe(0.19);
    // ρ = G × ρw × (1 + MC), Wood Handbook FPL-GTR-190 (2010) ch. 4 (from memory), shrinkage ignored.
    expect(lumberDensityKgM3('2x4 SPF-1/2')).toBeCloseTo(0.42 * 1000 * 1.19, 9); // 499.8
    expect(lumberDensityKgM3('2x4 SP-2')).toBeCloseTo(0.55 * 1000 * 1.19, 9); // 654.5
  });

  it('a 2x4 SPF, 10 ft: 1.5 × 3.5 in × 120 in at G 0.42 and 19 % moisture, by hand', () => {
    // Volume = 1.5 × 3.5 × 120 in³ = 630 in³ = 630 × 16.387064 cm³ = 10,323.85 cm³ = 0.01032385 m³.
    // Mass = 0.01032385 m³ × 0.42 × 1000 kg/m³ × 1.19 = 5.1599 kg. The same in pounds:
    // 630 / 1728 ft³ × 0.42 × 62.43 lb/ft³ × 1.19 = 11.376 lb = 5.160 kg.
    expect(lumberMassKg('2x4 SPF-1/2', mm(3048))).toBeCloseTo(5.1599, 3);
  });
});
