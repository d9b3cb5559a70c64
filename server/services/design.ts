import { designInputSchema, toEngineInput, type DesignInput } from '../../shared/api/design';
import { designTruss, presentDesign, type PresentedDesign } from '../../shared/engine/design';
import { isEngineError } from '../../shared/engine/errors';
import { ENGINE_VERSION } from '../../shared/engine/version';
import { PROFILE_KIND_LABELS } from '../../shared/engine/profiles';
import { formatFeetInches, formatMm } from '../../shared/engine/format';
import { inch, inchToMm, mm } from '../../shared/engine/units';
import { AppError } from '../errors';
import { fieldMessages } from '../middleware/validate';
import { DEFAULT_DESIGN_RULES, type DesignRules } from '../../shared/api/plant';
import { engineOptionsOf } from './designRules';

/** The server's own computation of one design: what is saved, priced and printed. */
export interface ComputedDesign {
  input: DesignInput;
  result: PresentedDesign;
  engineVersion: string;
  ok: boolean;
  maxCsi: number | null;
  warningCount: number;
  profile: string;
  description: string;
  /** The plant's design rules the engine ran with (stored with the design). */
  rules: DesignRules;
}

/** Short line text in the design's own units, e.g. `Fink 28'-0" 6/12`. */
export function describeDesign(input: DesignInput) {
  const label = PROFILE_KIND_LABELS[input.profile] ?? input.profile;
  const span =
    input.units === 'imperial'
      ? formatFeetInches(inchToMm(inch(input.span)))
      : formatMm(mm(input.span));
  const pitch =
    input.profile === 'flat'
      ? `${input.panels ?? ''} panels`.trim()
      : `${Number(input.pitch.toFixed(3))}/12`;
  return `${label} ${span} ${pitch}`.slice(0, 120);
}

/**
 * Parse the design input with the shared schema and run the engine. Bad input and geometry that
 * cannot be built answer 400 and store nothing; a design that merely fails its checks is returned
 * with `ok: false` so the desk sees why. `rules` are the plant's (`loadDesignRules`); the
 * design's notes say which panel-point moment rule was used.
 */
export function computeDesign(
  raw: unknown,
  overrides: { plies?: number } = {},
  fieldPrefix = 'design.',
  rules: DesignRules = DEFAULT_DESIGN_RULES,
): ComputedDesign {
  const body = raw && typeof raw === 'object' ? { ...(raw as object), ...overrides } : raw;
  const parsed = designInputSchema.safeParse(body);
  if (!parsed.success) {
    const fields = Object.fromEntries(
      Object.entries(fieldMessages(parsed.error)).map(([k, v]) => [`${fieldPrefix}${k}`, v]),
    );
    throw new AppError(400, 'invalid', Object.values(fields)[0] ?? 'Check the design.', fields);
  }
  try {
    const design = designTruss(toEngineInput(parsed.data), engineOptionsOf(rules));
    const result = presentDesign(design, parsed.data.units);
    const csis = result.members.map((m) => m.csi).filter(Number.isFinite);
    return {
      input: parsed.data,
      result,
      engineVersion: ENGINE_VERSION,
      ok: result.ok,
      maxCsi: csis.length ? Math.max(...csis) : null,
      warningCount: result.warnings.length,
      profile: parsed.data.profile,
      description: describeDesign(parsed.data),
      rules,
    };
  } catch (e) {
    if (isEngineError(e))
      throw new AppError(400, e.code, e.message, {
        [fieldPrefix.replace(/\.$/, '') || 'design']: e.message,
      });
    throw e;
  }
}
