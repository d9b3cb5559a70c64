import { EngineError } from '../errors';
import { luSolve } from './dense';
import type { PreparedTruss } from './prepare';
import type { MemberForce } from './types';

/**
 * Displacement of one joint by the unit-load (virtual work) method: δ = Σ N·n·L/(E·A), where N
 * are the real member forces (e.g. `solveLoads(...).members`) and n the forces from a unit load
 * at `joint` along +`direction`. Needs a determinate truss (n from its LU) and `ea` on every
 * member; throws EngineError `indeterminate` or `invalid` otherwise.
 */
export function unitLoadDeflection(
  prepared: PreparedTruss,
  forces: readonly MemberForce[],
  joint: string,
  direction: 'x' | 'y',
): number {
  const g = prepared.geometry;
  if (!prepared.lu) {
    throw new EngineError(
      'indeterminate',
      'The unit-load deflection here needs a statically determinate truss.',
      { redundants: prepared.redundants },
    );
  }
  const missing = g.memberIds.filter((_, k) => Number.isNaN(g.ea[k]));
  const j = g.jointIndex.get(joint);
  const real = new Float64Array(g.memberIds.length).fill(NaN);
  for (const f of forces) {
    const k = g.memberIndex.get(f.id);
    if (k !== undefined) real[k] = f.force;
  }
  const unknownForces = g.memberIds.filter((_, k) => !Number.isFinite(real[k]));
  if (missing.length > 0 || j === undefined || unknownForces.length > 0) {
    throw new EngineError(
      'invalid',
      'A unit-load deflection needs ea and a finite force for every member, at a known joint: ' +
        [
          missing.length > 0 ? `no ea for ${missing.join(', ')}` : '',
          j === undefined ? `unknown joint "${joint}"` : '',
          unknownForces.length > 0 ? `no force for ${unknownForces.join(', ')}` : '',
        ]
          .filter(Boolean)
          .join('; ') +
        '.',
      { members: missing, joint, forcesMissing: unknownForces },
    );
  }
  const { load: rhs, unknowns: n } = prepared.scratch;
  // A·n = −(unit load): the same LU as the real load case.
  rhs.fill(0);
  rhs[2 * j + (direction === 'x' ? 0 : 1)] = -1;
  luSolve(prepared.lu, rhs, n);
  let delta = 0;
  for (let k = 0; k < g.memberIds.length; k++) {
    delta += (real[k] * n[k] * g.length[k]) / g.ea[k];
  }
  return delta;
}
