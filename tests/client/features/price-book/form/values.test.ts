import { describe, expect, it } from 'vitest';
import type { PriceBook } from '../../../../../shared/api/pricing';
import {
  formPathOfServerField,
  priceBookFormSchema,
  priceBookToFormValues,
} from '../../../../../src/features/price-book/form/values';

// Invented demo prices. The 30-day validity and a deposit up to 50 % are common practice
// (DESIGN.md §1: quotes valid about 30 days; deposits of up to 50 % are common).
const stored: PriceBook = {
  currency: 'USD',
  lumber: { defaultPerBoardFoot: 0.85, byLumber: { '2x4 SPF No.2': 0.8, '2x6 SYP No.2': 1.05 } },
  plates: { defaultPerSquareInch: 0.02, byPlate: { '4x6-20': 0.45 } },
  labour: { perTruss: 6, perPiece: 1.5, perJoint: 0.75, ratePerHour: 38 },
  deliveryCharge: 250,
  margin: 0.22,
  taxRate: 0.0825,
  depositRate: 0.5,
  cancellationFee: 150,
  quoteValidityDays: 30,
  terms: 'Net 30 for account customers.',
};

describe('price book form values', () => {
  it('shows fractions as percentages and overrides as rows in stored order', () => {
    const values = priceBookToFormValues(stored);
    expect(values.margin).toBe(22);
    expect(values.taxRate).toBe(8.25);
    expect(values.depositRate).toBe(50);
    expect(values.lumber.byLumber).toEqual([
      { id: '2x4 SPF No.2', cost: 0.8 },
      { id: '2x6 SYP No.2', cost: 1.05 },
    ]);
    expect(values.plates.byPlate).toEqual([{ id: '4x6-20', cost: 0.45 }]);
  });

  it('turns the form back into exactly the stored book', () => {
    const parsed = priceBookFormSchema.safeParse(priceBookToFormValues(stored));
    expect(parsed.success).toBe(true);
    expect(parsed.data).toEqual(stored);
  });

  it('trims override ids and upper-cases the currency, as the server does', () => {
    const values = priceBookToFormValues(stored);
    values.currency = 'cad';
    values.lumber.byLumber = [{ id: '  2x8 DF No.1 ', cost: 1.4 }];
    const parsed = priceBookFormSchema.parse(values);
    expect(parsed.currency).toBe('CAD');
    expect(parsed.lumber.byLumber).toEqual({ '2x8 DF No.1': 1.4 });
  });

  it('gives the server schema’s range messages for percentages', () => {
    const values = { ...priceBookToFormValues(stored), margin: 95, taxRate: -1 };
    const issues = priceBookFormSchema.safeParse(values).error?.issues ?? [];
    expect(issues).toContainEqual(
      expect.objectContaining({ path: ['margin'], message: 'Margin must be at most 90 %' }),
    );
    expect(issues).toContainEqual(
      expect.objectContaining({ path: ['taxRate'], message: 'Tax rate cannot be negative' }),
    );
  });

  it('asks for a number when a field is left empty (valueAsNumber gives NaN)', () => {
    const values = { ...priceBookToFormValues(stored), depositRate: Number.NaN };
    const issues = priceBookFormSchema.safeParse(values).error?.issues ?? [];
    expect(issues[0]).toMatchObject({ path: ['depositRate'], message: 'Deposit must be a number' });
  });

  it('edits the cancellation fee with the server’s money rules', () => {
    expect(priceBookToFormValues(stored).cancellationFee).toBe(150);
    const issue = (cancellationFee: number) =>
      priceBookFormSchema.safeParse({ ...priceBookToFormValues(stored), cancellationFee }).error
        ?.issues[0];
    expect(issue(-5)).toMatchObject({
      path: ['cancellationFee'],
      message: 'Cancellation fee cannot be negative',
    });
    expect(issue(Number.NaN)).toMatchObject({
      path: ['cancellationFee'],
      message: 'Cancellation fee must be a number',
    });
    expect(issue(2_000_000)?.message).toBe('Cancellation fee looks too large');
    expect(
      priceBookFormSchema.parse({ ...priceBookToFormValues(stored), cancellationFee: 75 }),
    ).toMatchObject({ cancellationFee: 75 });
  });

  it('shows a book saved before the fee existed as no fee (the server refunds it all)', () => {
    const { cancellationFee: _fee, ...older } = stored;
    expect(priceBookToFormValues(older).cancellationFee).toBe(0);
  });

  it('flags blank and repeated override ids on their rows', () => {
    const values = priceBookToFormValues(stored);
    values.lumber.byLumber = [
      { id: '2x4 SPF No.2', cost: 0.8 },
      { id: '', cost: 1 },
      { id: '2x4 SPF No.2 ', cost: 0.9 },
    ];
    const issues = priceBookFormSchema.safeParse(values).error?.issues ?? [];
    expect(issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['lumber.byLumber.1.id', 'Enter a lumber id'],
      ['lumber.byLumber.2.id', '2x4 SPF No.2 is listed twice'],
    ]);
  });
});

describe('server messages beside the price book fields', () => {
  const values = priceBookToFormValues(stored);

  it('maps a record key (which may hold dots) to its row’s cost', () => {
    expect(formPathOfServerField('lumber.byLumber.2x6 SYP No.2', values)).toBe(
      'lumber.byLumber.1.cost',
    );
    expect(formPathOfServerField('plates.byPlate.4x6-20', values)).toBe('plates.byPlate.0.cost');
  });

  it('keeps plain paths and drops what no field shows', () => {
    expect(formPathOfServerField('margin', values)).toBe('margin');
    expect(formPathOfServerField('labour.ratePerHour', values)).toBe('labour.ratePerHour');
    expect(formPathOfServerField('lumber.byLumber.unknown', values)).toBeNull();
    expect(formPathOfServerField('lumber.byLumber', values)).toBeNull();
    expect(formPathOfServerField('plantId', values)).toBeNull();
  });
});
