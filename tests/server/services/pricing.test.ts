import { describe, expect, it } from 'vitest';
import {
  DEMO_PRICE_BOOK,
  pieceBoardFeet,
  priceLine,
  priceQuote,
  roundCents,
  stockLengthFeet,
  type PricedLineInput,
} from '../../../server/services/pricing';
import type { PriceBook } from '../../../shared/api/pricing';

// Invented demo prices; the arithmetic below is worked by hand.
const BOOK: PriceBook = {
  ...DEMO_PRICE_BOOK,
  lumber: { defaultPerBoardFoot: 1, byLumber: { '2x6 SPF-1/2': 1.5 } },
  plates: { defaultPerSquareInch: 0.01, byPlate: { '4x6-20': 0.5 } },
  labour: { perTruss: 10, perPiece: 2, perJoint: 1, ratePerHour: 60 },
  deliveryCharge: 100,
  margin: 0.2,
  taxRate: 0.1,
  depositRate: 0.5,
};

const piece = (mark: string, lumber: string, value: number) => ({
  mark,
  role: 'web',
  lumber,
  length: { value, text: '' },
  members: [],
  splices: [],
  csi: 0.5,
  failing: false,
});
const plate = (joint: string, id: string, w: number, l: number) => ({
  joint,
  kind: 'heel',
  ok: true,
  plate: id,
  widthIn: w,
  lengthIn: l,
});
const UNITS = {
  system: 'imperial',
  length: 'in',
  force: 'lbf',
  moment: 'lbf·ft',
  stress: 'psi',
  area: 'in²',
} as const;

// Three pieces and three joints of a made-up truss.
const LINE: PricedLineInput = {
  mark: 'T1',
  description: 'Demo',
  quantity: 3,
  plies: 1,
  design: {
    units: UNITS,
    pieces: [
      piece('TC1', '2x4 SPF-1/2', 100), // 8.33 ft → 10 ft stock: 2·4·10/12 = 6.6667 bf
      piece('BC1', '2x6 SPF-1/2', 96), // exactly 8 ft → 8 ft: 2·6·8/12 = 8 bf
      piece('W1', '2x4 SPF-1/2', 20), // 1.67 ft → 2 ft: 2·4·2/12 = 1.3333 bf
    ],
    plates: [plate('A', '4x6-20', 4, 6), plate('B', '3x4-20', 3, 4), plate('C', '4x6-20', 4, 6)],
    joints: [
      { id: 'A', x: 0, y: 0 },
      { id: 'B', x: 1, y: 0 },
      { id: 'C', x: 0, y: 1 },
    ],
  },
};

describe('stock lengths and board feet (board foot = 1 in × 12 in × 1 ft, common practice)', () => {
  it('rounds a cut length up to the next 2 ft stock increment (common practice)', () => {
    expect(stockLengthFeet(96)).toBe(8);
    expect(stockLengthFeet(96.0000001)).toBe(8); // float noise from mm ↔ in
    expect(stockLengthFeet(97)).toBe(10);
    expect(stockLengthFeet(20)).toBe(2);
    expect(stockLengthFeet(240)).toBe(20);
  });
  it('a 2x4 × 12 ft is 8 board feet; a 2x6 × 16 ft is 16 (nominal sizes)', () => {
    expect(pieceBoardFeet('2x4 SPF-1/2', 144)).toBeCloseTo(8, 10);
    expect(pieceBoardFeet('2x6 DFL-2', 190)).toBeCloseTo(16, 10);
  });
  it('rounds money half away from zero without float surprises', () => {
    expect(roundCents(1.005)).toBe(1.01);
    expect(roundCents(2.675)).toBe(2.68);
    expect(roundCents(0.1 + 0.2)).toBe(0.3);
  });
});

describe('a line priced by hand', () => {
  it('lumber, plates, labour, margin and quantity', () => {
    const l = priceLine(LINE, BOOK);
    // Board feet: 6.6667 + 8 + 1.3333 = 16 bf.
    expect(l.boardFeet).toBe(16);
    // Lumber: 2x4 at the default $1/bf: 8 bf → $8; 2x6 at $1.50/bf: 8 bf → $12. Sum $20.
    expect(l.lumberCost).toBe(20);
    // Plates, 2 per joint: 4x6 by catalog 4 × $0.50 = $2; 3x4 by area 12 in² × $0.01 × 2 = $0.24.
    expect(l.plates).toEqual([
      { plate: '4x6-20', count: 4, cost: 2 },
      { plate: '3x4-20', count: 2, cost: 0.24 },
    ]);
    expect(l.plateCost).toBe(2.24);
    // Labour: 10 + 2·3 + 1·3 = 19 min at $60/h = $19.
    expect(l.labourMinutes).toBe(19);
    expect(l.labourCost).toBe(19);
    // Cost $41.24; price = 41.24 / (1 − 0.2) = $51.55; × 3 = $154.65.
    expect(l.unitCost).toBe(41.24);
    expect(l.unitPrice).toBe(51.55);
    expect(l.lineTotal).toBe(154.65);
  });

  it('two plies double pieces, plates and per-piece/per-joint labour, not the per-truss minutes', () => {
    const l = priceLine({ ...LINE, plies: 2 }, BOOK);
    expect(l.boardFeet).toBe(32);
    expect(l.lumberCost).toBe(40);
    expect(l.plateCost).toBe(4.48);
    // 10 + 2·3·2 + 1·3·2 = 28 min → $28.
    expect(l.labourMinutes).toBe(28);
    // (40 + 4.48 + 28) / 0.8 = 90.60.
    expect(l.unitPrice).toBe(90.6);
  });

  it('metric designs measure pieces in mm', () => {
    const metric: PricedLineInput = {
      ...LINE,
      design: {
        ...LINE.design,
        units: { ...UNITS, system: 'metric', length: 'mm' },
        pieces: LINE.design.pieces.map((p) => ({
          ...p,
          length: { value: p.length.value * 25.4, text: '' },
        })),
      },
    };
    expect(priceLine(metric, BOOK).lineTotal).toBe(154.65);
  });
});

describe('a quote priced by hand', () => {
  it('subtotal, delivery once, tax on both, total and a deposit on deposit terms only', () => {
    const q = priceQuote([LINE, { ...LINE, mark: 'T2', quantity: 1 }], BOOK, 'deposit');
    // Subtotal 154.65 + 51.55 = 206.20; + delivery 100 = 306.20; tax 10 % = 30.62; total 336.82.
    expect(q).toMatchObject({ subtotal: 206.2, delivery: 100, tax: 30.62, total: 336.82 });
    // Deposit 50 % of 336.82 = 168.41.
    expect(q.depositDue).toBe(168.41);
    const account = priceQuote([LINE], BOOK, 'account');
    expect(account.depositDue).toBe(0);
    expect(account.depositRate).toBe(0);
  });
});
