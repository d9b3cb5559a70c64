import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { memberDemands, type MemberDemands } from '../../../../shared/engine/design/demands';
import {
  checkOverCombinations,
  chooseForGroup,
  criticalCombinations,
  effectiveLengths,
  sizingOptions,
  type SizingContext,
} from '../../../../shared/engine/design/sizing';
import { designFrame } from '../../../../shared/engine/design/frameModel';
import { lumberCandidates } from '../../../../shared/engine/design/lumberChoice';
import { generateProfile } from '../../../../shared/engine/profiles';
import type { TrussProfile } from '../../../../shared/engine/profiles/types';

// A 24 ft 4/12 Fink line model (demo geometry) whose demands the tests overwrite.
const profile: TrussProfile = generateProfile({
  kind: 'fink',
  span: 7315.2,
  pitch: 4,
  heelHeight: 0,
  overhangLeft: 0,
  overhangRight: 0,
});
const m = profile.members.length;

/** A context with invented demands: `axial[i][k]` N and `moment[i][k]` N·mm. */
function context(axial: number[][], moment: number[][], cds: number[]): SizingContext {
  const demands: MemberDemands = {
    combinations: cds.length,
    members: m,
    axial: Float64Array.from(axial.flat()),
    moment: Float64Array.from(moment.flat()),
    spanMoment: Float64Array.from(moment.flat()),
    supportMoment: new Float64Array(moment.flat().length),
    shear: new Float64Array(moment.flat().length),
    startShear: new Float64Array(moment.flat().length),
    endShear: new Float64Array(moment.flat().length),
    rx: new Float64Array(2 * cds.length),
    ry: new Float64Array(2 * cds.length),
    supports: ['A', 'D'],
  };
  return {
    profile,
    demands,
    cds,
    plies: 1,
    repetitive: true,
    bracedWebs: new Set(),
    critical: profile.members.map((_, k) => criticalCombinations(demands, cds, k)),
  };
}

const CDS = [0.9, 1.0, 1.15, 1.25, 1.6]; // NDS 2018 Table 2.3.2 durations

describe('criticalCombinations', () => {
  it('never changes the worst CSI (dominated combinations cannot govern)', () => {
    const demand = fc.record({
      axial: fc.array(
        fc.array(fc.double({ min: -40000, max: 40000, noNaN: true }), {
          minLength: m,
          maxLength: m,
        }),
        { minLength: 5, maxLength: 5 },
      ),
      moment: fc.array(
        fc.array(fc.double({ min: 0, max: 2e6, noNaN: true }), { minLength: m, maxLength: m }),
        { minLength: 5, maxLength: 5 },
      ),
      cds: fc.array(fc.constantFrom(...CDS), { minLength: 5, maxLength: 5 }),
    });
    fc.assert(
      fc.property(demand, ({ axial, moment, cds }) => {
        const ctx = context(axial, moment, cds);
        const all = { ...ctx, critical: ctx.critical.map(() => [0, 1, 2, 3, 4]) };
        for (const k of [0, 4, 7]) {
          for (const option of [
            { lumber: '2x4 SPF-1/2', braced: false },
            { lumber: '2x6 DFL-2', braced: true },
          ]) {
            const fast = checkOverCombinations(ctx, k, option);
            const full = checkOverCombinations(all, k, option);
            expect(fast.csi).toBeWithin(full.csi, { rel: 1e-12 });
          }
        }
      }),
      { numRuns: 60 },
    );
  });

  it('keeps one of two identical combinations', () => {
    const axial = [Array(m).fill(-1000), Array(m).fill(-1000)];
    const moment = [Array(m).fill(0), Array(m).fill(0)];
    const ctx = context(axial, moment, [1.25, 1.25]);
    expect(ctx.critical[0]).toEqual([0]);
  });
});

describe('sizing order', () => {
  it('tries each lumber unbraced, then braced (webs only)', () => {
    expect(sizingOptions(['2x4 SPF-1/2', '2x6 SPF-1/2'], true, false)).toEqual([
      { lumber: '2x4 SPF-1/2', braced: false },
      { lumber: '2x4 SPF-1/2', braced: true },
      { lumber: '2x6 SPF-1/2', braced: false },
      { lumber: '2x6 SPF-1/2', braced: true },
    ]);
    expect(sizingOptions(['2x4 SPF-1/2'], false, false)).toEqual([
      { lumber: '2x4 SPF-1/2', braced: false },
    ]);
  });

  it('candidates run cheapest first by relative cost per foot', () => {
    expect(
      lumberCandidates('web', { webs: ['2x6 SPF-1/2', '2x4 MSR-2100-1.8E', '2x4 SPF-1/2'] }, {}),
    ).toEqual(['2x4 SPF-1/2', '2x4 MSR-2100-1.8E', '2x6 SPF-1/2']);
  });

  it('"2x4 with a brace" beats "2x6" for a web that buckles out of plane', () => {
    // Web BE (the first web) in compression only; effective lengths per NDS 2018 3.7.1.
    const k = profile.members.findIndex((x) => x.role === 'web');
    const web = profile.members[k];
    expect(effectiveLengths(web, true).leWeak).toBeWithin(web.length / 2, { rel: 1e-12 });
    const axial = [Array<number>(m).fill(0)];
    const moment = [Array<number>(m).fill(0)];
    const ctx = context(axial, moment, [1.15]);
    // Find a compression that the unbraced 2x4 cannot carry but the braced one can.
    const unbraced = { lumber: '2x4 SPF-1/2', braced: false };
    const braced = { lumber: '2x4 SPF-1/2', braced: true };
    ctx.demands.axial[k] = -1;
    const perNewton = checkOverCombinations(ctx, k, unbraced).csi;
    ctx.demands.axial[k] = -1.2 / perNewton;
    expect(checkOverCombinations(ctx, k, unbraced).csi).toBeGreaterThan(1);
    expect(checkOverCombinations(ctx, k, braced).csi).toBeLessThan(1);
    const choice = chooseForGroup(
      ctx,
      [k],
      sizingOptions(['2x4 SPF-1/2', '2x6 SPF-1/2'], true, false),
    );
    expect(choice).toMatchObject({ lumber: '2x4 SPF-1/2', braced: true, pass: true });
  });
});

describe('memberDemands', () => {
  it('solves each combination: forces scale with the loads (linear, determinate)', () => {
    const apex = profile.topChordJoints[2];
    const combo = (p: number) => ({
      name: 'P',
      cd: 1,
      terms: [],
      jointLoads: [{ joint: apex, fy: -p }],
      transverse: new Float64Array(m),
      overhangMoment: new Float64Array(m),
    });
    const d = memberDemands(
      profile,
      [combo(1000), combo(3000)],
      designFrame(profile, new Array<string>(m).fill('2x4 SPF-1/2'), 1),
    );
    for (let k = 0; k < m; k++) {
      expect(d.axial[m + k]).toBeWithin(3 * d.axial[k], { rel: 1e-9, abs: 1e-9 });
    }
    // Closed form: a point load at the apex splits equally between the two supports.
    expect(d.ry[0]).toBeWithin(500, { rel: 1e-12 });
    expect(d.ry[1]).toBeWithin(500, { rel: 1e-12 });
  });
});
