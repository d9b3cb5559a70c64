import type { ProfileComparison, ProfileComparisons } from '../../shared/api/compare';
import { PROFILE_KINDS } from '../../shared/api/design';
import type { PresentedDesign } from '../../shared/engine/design';
import { trussLumberMassKg } from '../../shared/engine/design';
import type { PriceBook } from '../../shared/api/pricing';
import { AppError } from '../errors';
import { computeDesign } from './design';
import { DEFAULT_DESIGN_RULES, type DesignRules } from '../../shared/api/plant';
import { PLATES_PER_JOINT, priceLine } from './pricing';

const LB_PER_KG = 2.2046226218;

/** Profiles compared for a pitched request: every pitched family (a flat truss has no pitch). */
const PITCHED = PROFILE_KINDS.filter((k) => k !== 'flat');

/**
 * The request as another profile: same span, pitch, heels, overhangs, spacing, plies, loads and
 * lumber choices; member-specific braces dropped (member ids differ between profiles); a scissor
 * takes the request's bottom pitch or half the top pitch (common practice).
 */
function asProfile(input: Record<string, unknown>, profile: string): Record<string, unknown> {
  const { webBraces: _braces, depth: _depth, panels: _panels, ...rest } = input;
  const request: Record<string, unknown> = { ...rest, profile };
  if (profile === 'scissor' && request.bottomPitch === undefined)
    request.bottomPitch = Number(request.pitch) / 2;
  if (profile !== 'scissor') delete request.bottomPitch;
  return request;
}

function summarize(
  profile: ProfileComparison['profile'],
  design: PresentedDesign,
  description: string,
  plies: number,
  book: PriceBook | null,
): ProfileComparison {
  const csis = design.members.map((m) => m.csi).filter(Number.isFinite);
  const kg = trussLumberMassKg(design, plies);
  const priced = priceLine(
    { mark: profile, description, quantity: 1, plies, design },
    book ?? PRICE_FREE,
  );
  return {
    profile,
    fits: true,
    message: null,
    ok: design.ok,
    maxCsi: csis.length ? Math.max(...csis) : null,
    boardFeet: priced.boardFeet,
    plates: design.plates.filter((p) => p.plate).length * PLATES_PER_JOINT * plies,
    pieces: design.pieces.length * plies,
    unitPrice: book ? priced.unitPrice : null,
    currency: book?.currency ?? null,
    weight: Math.round((design.units.length === 'mm' ? kg : kg * LB_PER_KG) * 10) / 10,
    description,
  };
}

/** A price book of zeros: board feet without prices, for roles that do not see prices. */
const PRICE_FREE: PriceBook = {
  currency: 'USD',
  lumber: { defaultPerBoardFoot: 0, byLumber: {} },
  plates: { defaultPerSquareInch: 0, byPlate: {} },
  labour: { perTruss: 0, perPiece: 0, perJoint: 0, ratePerHour: 0 },
  deliveryCharge: 0,
  margin: 0,
  taxRate: 0,
  depositRate: 0,
  quoteValidityDays: 30,
  terms: '',
};

/**
 * Design the request as every profile that can take its span and pitch, side by side: passes or
 * not, highest CSI, board feet, plates, estimated price and weight. Bad input answers 400 as the
 * preview does; a profile whose geometry cannot be built is listed with the reason.
 */
export function compareProfiles(
  raw: unknown,
  book: PriceBook | null,
  demoPrices: boolean,
  rules: DesignRules = DEFAULT_DESIGN_RULES,
): ProfileComparisons {
  const base = computeDesign(raw, {}, '', rules); // validates the request itself (400 with fields)
  const input = base.input as unknown as Record<string, unknown>;
  const kinds = base.input.profile === 'flat' ? (['flat'] as const) : PITCHED;
  const rows = kinds.map((profile): ProfileComparison => {
    try {
      const d =
        profile === base.input.profile
          ? base
          : computeDesign(asProfile(input, profile), {}, '', rules);
      return summarize(profile, d.result, d.description, base.input.plies, book);
    } catch (e) {
      if (!(e instanceof AppError)) throw e;
      return {
        profile,
        fits: false,
        message: e.message,
        ok: false,
        maxCsi: null,
        boardFeet: null,
        plates: null,
        pieces: null,
        unitPrice: null,
        currency: null,
        weight: null,
        description: null,
      };
    }
  });
  return {
    units: base.input.units,
    weightUnit: base.input.units === 'metric' ? 'kg' : 'lb',
    demoPrices: book !== null && demoPrices,
    rows,
  };
}
