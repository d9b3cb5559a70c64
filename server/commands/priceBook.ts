import type { Transaction } from 'sequelize';
import type { PriceBook as PriceBookData } from '../../shared/api/pricing';
import { PriceBook, User } from '../models';
import { DEMO_PRICE_BOOK } from '../services/pricing';
import { savePlantDocument } from './plantDocument';

/** The plant's stored book (with its editor), or null while it has none. */
export const findPriceBook = (plantId: number, t?: Transaction) =>
  PriceBook.findOne({
    where: { plantId },
    include: [{ model: User, as: 'editor' }],
    transaction: t,
  });

/** The prices a quote uses: the stored book, else the invented demo default (and says so). */
export async function pricesFor(plantId: number, t?: Transaction) {
  const stored = await findPriceBook(plantId, t);
  return { book: stored?.data ?? DEMO_PRICE_BOOK, demo: !stored };
}

/** Store the plant's price book (one per plant), replacing the previous one; audited. */
export async function savePriceBook(actor: User, data: PriceBookData) {
  return PriceBook.sequelize!.transaction(async (t) => {
    return savePlantDocument(PriceBook, 'price_book', actor, data, t);
  });
}
