/**
 * Pricing of truss lines from their stored designs and the plant's price book. Pure: no database,
 * no clock. Money stays unrounded inside a line and is rounded to cents once — the unit price — so
 * that unit price × quantity is the line total to the cent; tax and deposit are rounded once each.
 */
import {
  areaLoadText,
  loadRows,
  overhangText,
  overhangTips,
  parsedInput,
  spacingText,
} from './designFacts';
import type { PresentedDesign } from '../../shared/engine/design';
import type { PriceBook, QuoteLine } from '../../shared/api/pricing';

/** Lumber is sold in 2 ft increments (common practice; DESIGN.md §1). */
export const STOCK_INCREMENT_FT = 2;
/** Plates go on both faces of every joint (common practice; DESIGN.md §1). */
export const PLATES_PER_JOINT = 2;

const MM_PER_INCH = 25.4;
// Lengths a hair over a stock length (float noise from mm ↔ in) still fit that length.
const LENGTH_SLACK_FT = 1e-6;

/**
 * The plant default when none is stored. INVENTED demo values (`demo: true` on the response):
 * not market prices; the plant manager replaces them.
 */
export const DEMO_PRICE_BOOK: PriceBook = {
  currency: 'USD',
  lumber: {
    defaultPerBoardFoot: 0.9,
    byLumber: {
      '2x4 SPF-1/2': 0.85,
      '2x6 SPF-1/2': 0.92,
      '2x4 MSR-2100-1.8E': 1.15,
      '2x6 MSR-2100-1.8E': 1.22,
    },
  },
  plates: { defaultPerSquareInch: 0.012, byPlate: {} },
  labour: { perTruss: 6, perPiece: 1.5, perJoint: 1, ratePerHour: 42 },
  deliveryCharge: 250,
  margin: 0.25,
  taxRate: 0.07,
  depositRate: 0.3,
  cancellationFee: 150,
  quoteValidityDays: 30,
  terms:
    'Prices hold until the date shown. Builders on deposit terms pay the deposit on acceptance; ' +
    'the balance is due on delivery. Account builders pay on their account terms.',
};

/** Round money to cents, half away from zero, after dropping float noise below 1e-6 cent. */
export function roundCents(amount: number): number {
  const cents = Number((amount * 100).toFixed(6));
  return (Math.sign(cents) * Math.round(Math.abs(cents))) / 100 + 0;
}

/** The stock length bought for a cut piece: its length rounded up to the next 2 ft increment. */
export function stockLengthFeet(lengthIn: number): number {
  const feet = lengthIn / 12;
  return Math.max(
    STOCK_INCREMENT_FT,
    Math.ceil(feet / STOCK_INCREMENT_FT - LENGTH_SLACK_FT) * STOCK_INCREMENT_FT,
  );
}

/** Nominal thickness and width (in) of a lumber id, e.g. "2x4 SPF-1/2" → 2 × 4. */
export function nominalSize(lumberId: string): { thickness: number; width: number } {
  const m = /^(\d+)x(\d+)\b/.exec(lumberId.trim());
  if (!m) throw new Error(`Lumber "${lumberId}" has no nominal size`);
  return { thickness: Number(m[1]), width: Number(m[2]) };
}

/**
 * Board feet bought for one piece: nominal thickness × width (in) × stock length (ft) / 12
 * (the board-foot definition, common practice), with the stock length from `stockLengthFeet`.
 */
export function pieceBoardFeet(lumberId: string, lengthIn: number): number {
  const { thickness, width } = nominalSize(lumberId);
  return (thickness * width * stockLengthFeet(lengthIn)) / 12;
}

/** What pricing needs of an order line. */
export interface PricedLineInput {
  mark: string;
  description: string;
  quantity: number;
  plies: number;
  design: Pick<PresentedDesign, 'units' | 'pieces' | 'plates' | 'joints'>;
}

const inches = (design: PricedLineInput['design'], value: number) =>
  design.units.length === 'mm' ? value / MM_PER_INCH : value;

/** Prices one line: lumber, plates, labour per truss (all plies), then margin and quantity. */
export function priceLine(line: PricedLineInput, book: PriceBook): QuoteLine {
  const { design, plies } = line;
  let boardFeet = 0;
  let lumberCost = 0;
  for (const p of design.pieces) {
    const bf = pieceBoardFeet(p.lumber, inches(design, p.length.value)) * plies;
    boardFeet += bf;
    lumberCost += bf * (book.lumber.byLumber[p.lumber] ?? book.lumber.defaultPerBoardFoot);
  }

  const plateGroups = new Map<string, { count: number; cost: number }>();
  let plateCost = 0;
  for (const p of design.plates) {
    if (!p.plate) continue; // a joint without a designed plate cannot be quoted (the design fails)
    const each =
      book.plates.byPlate[p.plate] ??
      (p.widthIn ?? 0) * (p.lengthIn ?? 0) * book.plates.defaultPerSquareInch;
    const count = PLATES_PER_JOINT * plies;
    const group = plateGroups.get(p.plate) ?? { count: 0, cost: 0 };
    group.count += count;
    group.cost += each * count;
    plateGroups.set(p.plate, group);
    plateCost += each * count;
  }

  const { perTruss, perPiece, perJoint, ratePerHour } = book.labour;
  const labourMinutes =
    perTruss + perPiece * design.pieces.length * plies + perJoint * design.joints.length * plies;
  const labourCost = (labourMinutes / 60) * ratePerHour;
  const unitCost = lumberCost + plateCost + labourCost;
  // The one rounding of the line: the price of one truss; the line total is then exact cents.
  const unitPrice = roundCents(unitCost / (1 - book.margin));
  return {
    mark: line.mark,
    description: line.description,
    quantity: line.quantity,
    plies,
    boardFeet: Math.round(boardFeet * 100) / 100,
    lumberCost: roundCents(lumberCost),
    plates: [...plateGroups].map(([plate, g]) => ({
      plate,
      count: g.count,
      cost: roundCents(g.cost),
    })),
    plateCost: roundCents(plateCost),
    labourMinutes: Math.round(labourMinutes * 100) / 100,
    labourCost: roundCents(labourCost),
    unitCost: roundCents(unitCost),
    unitPrice,
    lineTotal: roundCents(unitPrice * line.quantity),
  };
}

/** A builder's payment terms: `deposit` pays `depositRate` of the total up front; `account` none. */
export type PaymentTerms = 'account' | 'deposit';

/** The priced quote: lines, subtotal, one delivery charge, tax, total and deposit due. */
export interface QuotePrice {
  lines: QuoteLine[];
  subtotal: number;
  delivery: number;
  taxRate: number;
  tax: number;
  total: number;
  depositRate: number;
  depositDue: number;
}

/** Prices every line, adds delivery once, tax on subtotal + delivery, and the deposit. */
export function priceQuote(
  lines: PricedLineInput[],
  book: PriceBook,
  terms: PaymentTerms,
): QuotePrice {
  const priced = lines.map((l) => priceLine(l, book));
  const subtotal = roundCents(priced.reduce((s, l) => s + l.lineTotal, 0));
  const delivery = roundCents(book.deliveryCharge);
  const tax = roundCents((subtotal + delivery) * book.taxRate);
  const total = roundCents(subtotal + delivery + tax);
  const depositRate = terms === 'deposit' ? book.depositRate : 0;
  return {
    lines: priced,
    subtotal,
    delivery,
    taxRate: book.taxRate,
    tax,
    total,
    depositRate,
    depositDue: roundCents(total * depositRate),
  };
}

/** What a quote keeps of one line's design: enough to describe and draw it, frozen. */
export interface QuoteDesignSummary {
  mark: string;
  description: string;
  engineVersion: string;
  /** Unit of the joint coordinates. */
  length: 'in' | 'mm';
  span: string;
  rise: string;
  /** "6/12" (null for a flat truss); a scissor adds its bottom-chord pitch. */
  pitch: string | null;
  bottomPitch: string | null;
  maxCsi: number | null;
  reviewState: string;
  joints: { id: string; x: number; y: number }[];
  members: { from: string; to: string; role: string }[];
  /**
   * What the builder must confirm: design loads, spacing, overhangs and heel as text, and the
   * overhang tips to draw (absent in quotes made before they were kept).
   */
  criteria?: QuoteDesignCriteria;
}

/** One truss's design criteria as the quote prints them. */
export interface QuoteDesignCriteria {
  /** [label, value] for TCLL, TCDL, BCLL, BCDL, snow, wind, concentrated loads. */
  loads: [string, string][];
  /** Short forms for a table cell: "pg 30 psf", "115 mph, exp. B", "uplift 12 psf" or "None". */
  snow: string;
  wind: string;
  spacing: string;
  overhangs: string;
  heel: string;
  /** Heel height in the joints' unit (in or mm). */
  heelHeight: number;
  overhangTips: {
    side: 'left' | 'right';
    heel: { x: number; y: number };
    tip: { x: number; y: number };
    text: string;
  }[];
}

/** The frozen contents of a quote revision (`quotes.snapshot`). */
export interface QuoteSnapshot {
  currency: string;
  units: 'imperial' | 'metric';
  plant: { name: string; address: string | null; phone?: string; email?: string };
  customer: { id: number; name: string; email: string; terms: PaymentTerms };
  job: { id: number; name: string; address: string };
  order: { id: number; number: string };
  price: QuotePrice;
  designs: QuoteDesignSummary[];
  terms: string;
  cautions: string[];
  /** The price book was the invented plant default, not one the plant stored. */
  demoPrices: boolean;
}

const pitchText = (v: unknown) => (typeof v === 'number' ? `${Number(v.toFixed(3))}/12` : null);

/** Snow and wind in a few words, for the quote's criteria table. */
function shortWindSnow(input: NonNullable<ReturnType<typeof parsedInput>>) {
  const { snow, wind, windUplift } = input.loads;
  const speed = input.units === 'imperial' ? 'mph' : 'm/s';
  const windParts = [
    wind ? `${wind.speed} ${speed}, exp. ${wind.exposure}` : '',
    windUplift !== undefined ? `uplift ${areaLoadText(input, windUplift)}` : '',
  ].filter(Boolean);
  return {
    snow: snow ? `pg ${areaLoadText(input, snow.pg)}` : 'None',
    wind: windParts.length ? windParts.join('; ') : 'None',
  };
}

/** The drawing and description of one stored design, as a quote keeps it. */
export function summarizeDesign(line: {
  mark: string;
  description: string;
  maxCsi: number | null;
  reviewState: string;
  engineVersion: string;
  designInput: Record<string, unknown>;
  design: PresentedDesign;
}): QuoteDesignSummary {
  const d = line.design;
  const input = parsedInput(line.designInput);
  const criteria: QuoteDesignCriteria | null = input && {
    loads: loadRows(input),
    ...shortWindSnow(input),
    spacing: spacingText(input),
    overhangs: overhangText(input),
    heel: d.heelHeight.requested.text,
    heelHeight: d.heelHeight.requested.value,
    overhangTips: overhangTips(input, d),
  };
  return {
    mark: line.mark,
    description: line.description,
    engineVersion: line.engineVersion,
    length: d.units.length,
    span: d.span.text,
    rise: d.rise.text,
    pitch: line.designInput.profile === 'flat' ? null : pitchText(line.designInput.pitch),
    bottomPitch: pitchText(line.designInput.bottomPitch),
    maxCsi: line.maxCsi,
    reviewState: line.reviewState,
    joints: d.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
    members: d.members.map((m) => ({ from: m.from, to: m.to, role: m.role })),
    ...(criteria && { criteria }),
  };
}
