import { EngineError } from '../errors';
import { GRADE_DATA, LUMBER_GRADES, isLumberGrade, type LumberGrade } from './referenceValues';
import { LUMBER_SIZES, isLumberSize, type LumberSize } from './sizes';

/** A lumber id, "<size> <grade>", e.g. "2x4 SPF-1/2". */
export type LumberId = `${LumberSize} ${LumberGrade}`;

/** Every valid lumber id: each size in each grade, sizes first. */
export function lumberIds(): LumberId[] {
  return LUMBER_SIZES.flatMap((size) =>
    LUMBER_GRADES.map((grade) => `${size} ${grade}` as LumberId),
  );
}

// A design parses the same few ids hundreds of times (every member check): canonical ids are
// parsed once. Only "<size> <grade>" exactly is kept, so arbitrary input cannot grow the cache.
const parsedIds = new Map<string, Readonly<{ size: LumberSize; grade: LumberGrade }>>();

/** Splits a lumber id into size and grade; throws EngineError('invalid') for anything else. */
export function parseLumberId(id: string): Readonly<{ size: LumberSize; grade: LumberGrade }> {
  const known = parsedIds.get(id);
  if (known) return known;
  const [size, grade, ...rest] = id.trim().split(/\s+/);
  if (rest.length > 0 || !size || !grade || !isLumberSize(size) || !isLumberGrade(grade)) {
    throw new EngineError(
      'invalid',
      `Unknown lumber "${id}": expected "<size> <grade>", e.g. "2x4 SPF-1/2".`,
      {
        lumberId: id,
        sizes: [...LUMBER_SIZES],
        grades: [...LUMBER_GRADES],
      },
    );
  }
  const parsed = Object.freeze({ size, grade });
  if (id === `${size} ${grade}`) parsedIds.set(id, parsed);
  return parsed;
}

/** True when `id` parses as a lumber id. */
export function isLumberId(id: string): id is LumberId {
  try {
    parseLumberId(id);
    return true;
  } catch {
    return false;
  }
}

/** Human label, e.g. "2x4 SPF No.1/No.2". */
export function lumberLabel(id: string): string {
  const { size, grade } = parseLumberId(id);
  return `${size} ${GRADE_DATA[grade].label}`;
}
