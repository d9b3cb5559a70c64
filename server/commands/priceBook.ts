import type { Transaction } from 'sequelize';
import type { PriceBook as PriceBookData } from '../../shared/api/pricing';
import { PriceBook, User } from '../models';
import { DEMO_PRICE_BOOK } from '../services/pricing';
import { audit } from './audit';

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
    const existing = await PriceBook.findOne({
      where: { plantId: actor.plantId },
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    const before = existing?.data ?? null;
    const book = existing
      ? await existing.update({ data, updatedBy: actor.id }, { transaction: t })
      : await PriceBook.create(
          { plantId: actor.plantId, data, updatedBy: actor.id },
          { transaction: t },
        );
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'price_book.saved',
      subjectType: 'price_book',
      subjectId: book.id,
      data: { before, after: data },
    });
    return book;
  });
}
