import { describe, expect, it } from 'vitest';
import {
  designTruss,
  presentDesign,
  trussLumberMassKg,
  type PresentedDesign,
} from '../../../../shared/engine/design';
import { lumberMassKg } from '../../../../shared/engine/lumber';
import { mm } from '../../../../shared/engine/units';
import { engineInput, lightFink } from './support/inputs';

const piece = (lumber: string, value: number) => ({
  mark: 'X',
  role: 'web',
  lumber,
  length: { value, text: '' },
  members: [],
  splices: [],
  csi: 0,
  failing: false,
});
const oneBoard = (length: 'in' | 'mm', value: number) =>
  ({ units: { length }, pieces: [piece('2x4 SPF-1/2', value)] }) as unknown as PresentedDesign;

describe('trussLumberMassKg: the one weight rule of tags, tickets and comparisons', () => {
  it('weighs each piece by lumberMassKg, in inches or millimetres, times plies (hand arithmetic)', () => {
    // A 10 ft 2x4 SPF: 1.5 × 3.5 × 120 in³ = 0.01032385 m³ × 0.42 × 1000 × 1.19 = 5.1599 kg.
    expect(trussLumberMassKg(oneBoard('in', 120), 1)).toBeCloseTo(5.1599, 3);
    expect(trussLumberMassKg(oneBoard('mm', 3048), 1)).toBeCloseTo(5.1599, 3);
    expect(trussLumberMassKg(oneBoard('in', 120), 3)).toBeCloseTo(3 * 5.1599, 3);
  });

  it('gives a designed truss the same weight in either unit system', () => {
    const d = designTruss(engineInput(lightFink()));
    const imperial = trussLumberMassKg(presentDesign(d, 'imperial'), 1);
    const metric = trussLumberMassKg(presentDesign(d, 'metric'), 1);
    expect(imperial).toBeCloseTo(metric, 1);
    const bySum = d.pieces.reduce((s, p) => s + lumberMassKg(p.lumber, mm(p.length)), 0);
    expect(imperial).toBeCloseTo(bySum, 1);
  });
});
