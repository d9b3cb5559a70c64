import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { engineInput, kingPost16, lightFink, TYPICAL_LOADS } from './support/inputs';

/**
 * How sizing and the frame analysis settle, checked by their logic and NDS 2018 §3.9.2. Designed
 * inside each test (README, mutation testing).
 */
describe('frame analysis and sizing passes', () => {
  it('every member fixed: the first analysis already uses the only allowed lumber, once', () => {
    const d = designTruss(engineInput(kingPost16(TYPICAL_LOADS)));
    expect(d.notes).toContain(
      'Frame analysed once, until the lumber it was analysed with is the lumber sizing chose (stiffness sets the force distribution).',
    );
    expect(d.warnings.join(' ')).not.toMatch(/did not settle/);
  });
});

describe('amplifying the panel-point moment too (NDS 2018 §3.9.2 read literally, a plant setting)', () => {
  it('can only raise a chord’s CSI: fb/(Fb′(1 − fc/FcE)) ≥ fb/Fb′', () => {
    const draft = lightFink({
      lumber: { topChord: ['2x4 SPF-1/2'], bottomChord: ['2x4 SPF-1/2'] },
    });
    const plain = designTruss(engineInput(draft));
    const amplified = designTruss(engineInput(draft), { amplifyPanelPointMoment: true });
    let higher = 0;
    plain.members.forEach((m, k) => {
      const a = amplified.members[k];
      expect(a.lumber).toBe(m.lumber);
      expect(a.csi).toBeGreaterThanOrEqual(m.csi - 1e-12);
      if (a.csi > m.csi * (1 + 1e-9)) higher += 1;
    });
    expect(higher).toBeGreaterThan(0);
  });
});
