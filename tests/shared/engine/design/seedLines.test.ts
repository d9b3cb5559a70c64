import { describe, expect, it } from 'vitest';
import { designTruss } from '../../../../shared/engine/design';
import { ORDERS } from '../../../../seeders/orderLines';
import { engineInput } from './support/inputs';
import type { DesignInputDraft } from '../../../../shared/api/design';

/** The demo data must show designs that pass: every seeded truss line designs ok. */
describe('demo order lines', () => {
  for (const order of ORDERS) {
    for (const line of order.lines) {
      it(`${order.number} ${line.mark} designs ok`, () => {
        const design = designTruss(engineInput({ ...(line.design as DesignInputDraft), plies: 1 }));
        expect(design.warnings).toEqual([]);
        expect(design.ok).toBe(true);
      });
    }
  }
});
