import { describe, expect, it } from 'vitest';
import { lumberMassKg, specificGravity } from '../../../../shared/engine/lumber';
import { mm } from '../../../../shared/engine/units';

describe('estimated lumber weight', () => {
  it('uses the NDS 2018 Table 12.3.3A specific gravity of the species group', () => {
    expect(specificGravity('2x4 SPF-1/2')).toBe(0.42);
    expect(specificGravity('2x4 SP-2')).toBe(0.55);
    expect(specificGravity('2x6 DFL-2')).toBe(0.5);
    expect(specificGravity('2x4 MSR-2100-1.8E')).toBe(0.42); // MSR assumed SPF stock
  });

  it('a 2x4 SPF, 10 ft: 1.5 × 3.5 in × 120 in at G 0.42 and 15 % moisture, by hand', () => {
    // Volume = 1.5 × 3.5 × 120 in³ = 630 in³ = 630 × 16.387064 cm³ = 10,323.85 cm³ = 0.010324 m³.
    // Mass = 0.010324 m³ × 0.42 × 1000 kg/m³ × 1.15 = 4.9864 kg (about 11.0 lb).
    expect(lumberMassKg('2x4 SPF-1/2', mm(3048))).toBeCloseTo(4.9864, 3);
  });
});
