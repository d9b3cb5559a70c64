import { EngineError } from '../errors';
import { isLumberId, relativeCostPerFoot } from '../lumber';
import type { MemberRole } from '../profiles/types';
import type { LumberChoices } from './types';

/**
 * Lumber tried when the request allows none for a role: common truss stock in 2x4, 2x6 and 2x8
 * of SPF No.1/No.2, Southern Pine No.2, Douglas Fir-Larch No.2 and MSR 2100f-1.8E (common
 * practice; a plant's own list replaces it).
 */
export const DEFAULT_LUMBER: readonly string[] = ['2x4', '2x6', '2x8'].flatMap((size) =>
  ['SPF-1/2', 'SP-2', 'DFL-2', 'MSR-2100-1.8E'].map((grade) => `${size} ${grade}`),
);

const KEY: Record<MemberRole, keyof LumberChoices> = {
  topChord: 'topChord',
  bottomChord: 'bottomChord',
  web: 'webs',
};

/**
 * Candidates for one role, cheapest first by `relativeCostPerFoot` (ties keep the given order):
 * the request's list (one id = fixed), else the plant default, else DEFAULT_LUMBER. Throws
 * EngineError `invalid` for an unknown lumber id.
 */
export function lumberCandidates(
  role: MemberRole,
  requested: LumberChoices,
  plantDefault: LumberChoices = {},
): string[] {
  const list = requested[KEY[role]] ?? plantDefault[KEY[role]] ?? DEFAULT_LUMBER;
  const unique = [...new Set(list.map((id) => id.trim()))];
  const unknown = unique.filter((id) => !isLumberId(id));
  if (unique.length === 0 || unknown.length > 0) {
    throw new EngineError(
      'invalid',
      unique.length === 0
        ? `No lumber is allowed for the ${KEY[role]}.`
        : `Unknown lumber for the ${KEY[role]}: ${unknown.join(', ')}.`,
      { role, unknown },
    );
  }
  const cost = new Map(unique.map((id) => [id, relativeCostPerFoot(id)]));
  return unique
    .map((id, i) => ({ id, i }))
    .sort((a, b) => cost.get(a.id)! - cost.get(b.id)! || a.i - b.i)
    .map((x) => x.id);
}
