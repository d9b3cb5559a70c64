import { describe, expect, it } from 'vitest';
import { designTruss, presentDesign } from '../../../../shared/engine/design';
import { engineInput, kingPost16, SCISSOR_32 } from './support/inputs';

// Exact conversions: 1 in = 25.4 mm, 1 lbf = 4.4482216152605 N, 1 psi = 0.00689475729 MPa.
describe('the additional checks as presented (imperial)', () => {
  it('uplift in lbf, shear in lbf and psi, deflections and roller movement in inches', () => {
    const uplift = designTruss(
      engineInput(kingPost16({ tcll: 20, tcdl: 10, bcll: 0, bcdl: 10, windUplift: 30 })),
    );
    const p = presentDesign(uplift, 'imperial').additional!;
    const u = uplift.additional.uplift[0];
    expect(p.uplift[0]).toEqual({
      joint: u.joint,
      force: Math.round((u.force / 4.4482216152605) * 10) / 10,
      combination: '0.6D + 0.6W',
    });
    const s = uplift.additional.shear[0];
    expect(p.shear[0].fv).toBeWithin(s.fv / 0.00689475729, { abs: 0.05 });
    expect(p.longTermDeflection.max).toBeWithin(uplift.additional.longTermDeflection.max / 25.4, {
      abs: 1e-4,
    });

    const scissor = designTruss(engineInput(SCISSOR_32));
    const r = presentDesign(scissor, 'imperial').additional!.rollerMovement!;
    expect(r.movement).toBeWithin(scissor.additional.deflection.rollerMovement!.movement / 25.4, {
      abs: 1e-4,
    });
    expect(presentDesign(scissor, 'metric').additional!.midPanel.total.max).toBeWithin(
      scissor.additional.deflection.midPanel.total.max,
      { abs: 0.005 },
    );
  });
});
