import { describe, expect, it } from 'vitest';
import { designTruss, presentDesign } from '../../../../shared/engine/design';
import { N_PER_LBF } from '../../../../shared/engine/units';
import { engineInput, lightFink } from './support/inputs';

describe('presentDesign', () => {
  const d = designTruss(engineInput(lightFink()));
  const imperial = presentDesign(d, 'imperial');
  const metric = presentDesign(d, 'metric');

  it('names its units', () => {
    expect(imperial.units).toEqual({
      system: 'imperial',
      length: 'in',
      force: 'lbf',
      moment: 'lbf·ft',
      stress: 'psi',
      area: 'in²',
    });
    expect(metric.units.length).toBe('mm');
    expect(metric.units.force).toBe('kN');
  });

  it('lengths: inches with feet-inches text, or mm (1 in = 25.4 mm exactly)', () => {
    expect(imperial.span).toEqual({ value: 288, text: `24'-0"` });
    expect(metric.span).toEqual({ value: 7315.2, text: '7315 mm' });
    expect(imperial.heelHeight.requested).toEqual({ value: 4, text: `0'-4"` });
  });

  it('forces: lbf (1 lbf = 4.4482216152605 N) or kN', () => {
    const r = d.reactions[0];
    expect(imperial.reactions[0].maxDown).toBeWithin(r.maxDown / N_PER_LBF, { abs: 0.05 });
    expect(metric.reactions[0].maxDown).toBeWithin(r.maxDown / 1000, { abs: 0.0005 });
    const m = d.members[0];
    expect(imperial.members[0].forces).toHaveLength(d.combinations.length);
    expect(imperial.members[0].maxCompression).toBeWithin(m.maxCompression / N_PER_LBF, {
      abs: 0.05,
    });
    // N·mm → lbf·ft: ÷ N_PER_LBF ÷ 304.8.
    expect(imperial.members[0].maxMoment).toBeWithin(m.maxMoment / N_PER_LBF / 304.8, {
      abs: 0.05,
    });
  });

  it('is plain JSON (no Infinity) and keeps the cautions, warnings and notes', () => {
    const back = JSON.parse(JSON.stringify(imperial));
    expect(back).toEqual(imperial);
    expect(imperial.cautions).toEqual(d.cautions);
    expect(imperial.notes).toEqual(d.notes);
    expect(imperial.ok).toBe(d.ok);
  });
});
