import type { PriceBook as PriceBookData, Quote as QuoteBody } from '../../shared/api/pricing';
import type { PriceBook, Quote, User } from '../models';
import type { QuoteSnapshot } from '../services/pricing';

/** `GET/PUT /api/price-book`: the book, and whether it is the invented plant default. */
export interface PriceBookBody extends PriceBookData {
  /** True when the plant has stored no book yet and these are invented demo values. */
  demo: boolean;
  updatedAt: string | null;
  updatedBy: string | null;
}

/** The plant's stored price book, or the demo default (`demo: true`) when it has none. */
export function presentPriceBook(stored: PriceBook | null, fallback: PriceBookData): PriceBookBody {
  return {
    ...(stored?.data ?? fallback),
    demo: !stored,
    updatedAt: stored?.updatedAt.toISOString() ?? null,
    updatedBy: stored?.editor?.name ?? null,
  };
}

/** What the builder sees of a line: prices, never the plant's costs (which imply its margin). */
const builderLine = (l: QuoteBody['lines'][number]) => ({
  mark: l.mark,
  description: l.description,
  quantity: l.quantity,
  plies: l.plies,
  boardFeet: l.boardFeet,
  plates: l.plates.map((p) => ({ plate: p.plate, count: p.count })),
  unitPrice: l.unitPrice,
  lineTotal: l.lineTotal,
});

/** A quote revision as the client sees it (shared `quoteSchema`); money as numbers. */
export function presentQuote(q: Quote, superseded: boolean, viewer: User): QuoteBody {
  const s = q.snapshot as unknown as QuoteSnapshot;
  return {
    id: q.id,
    orderId: q.orderId,
    number: q.number,
    reference: q.reference,
    currency: s.currency,
    lines: viewer.role === 'builder' ? s.price.lines.map(builderLine) : s.price.lines,
    subtotal: s.price.subtotal,
    delivery: s.price.delivery,
    tax: s.price.tax,
    total: Number(q.total),
    depositRate: s.price.depositRate,
    depositDue: Number(q.depositDue),
    validUntil: q.validUntil,
    terms: s.terms,
    cautions: s.cautions,
    createdAt: q.createdAt.toISOString(),
    createdBy: q.creator?.name ?? null,
    sentAt: q.sentAt?.toISOString() ?? null,
    sentTo: q.sentTo ?? null,
    superseded,
  };
}
