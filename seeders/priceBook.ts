/** The demo plant's price book: the invented default prices, stored so quotes use a plant book. */
import { PriceBook, type Plant } from '../server/models';
import { DEMO_PRICE_BOOK } from '../server/services/pricing';

/** Store the demo price book once (idempotent: an existing book, maybe edited, is kept). */
export async function seedPriceBook(plant: Plant) {
  await PriceBook.findOrCreate({
    where: { plantId: plant.id },
    defaults: { plantId: plant.id, data: DEMO_PRICE_BOOK, updatedBy: null },
  });
}
