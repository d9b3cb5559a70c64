import { describe, expect, it } from 'vitest';
import { weightIn } from '../../../../server/services/shopPaper/weight';

describe('truss weight on shop paper', () => {
  it('prints whole pounds or kilograms of the engine’s estimate (kg)', () => {
    // 35.2 kg / 0.45359237 kg/lb = 77.6 lb (the international pound, exact by definition).
    expect(weightIn(35.2, 'imperial')).toEqual({ value: 78, unit: 'lb', text: 'est. 78 lb' });
    expect(weightIn(45.4, 'metric')).toEqual({ value: 45, unit: 'kg', text: 'est. 45 kg' });
    expect(weightIn(1000, 'imperial').text).toBe('est. 2,205 lb');
  });
});
