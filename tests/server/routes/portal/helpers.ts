import { createQuote, sendQuote } from '../../../../server/commands/quotes';
import { PriceBook, type Plant } from '../../../../server/models';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createUser,
} from '../../../support/factories';
import { TEST_BOOK } from '../quotes/helpers';

/** The test price book (40 % deposit) with a $100 cancellation fee (invented round numbers). */
export async function useTestBook(plant: Plant) {
  await PriceBook.create({
    plantId: plant.id,
    data: { ...TEST_BOOK, cancellationFee: 100 },
    updatedBy: null,
  });
}

/**
 * A builder company of the plant (deposit terms unless said), its builder user, and an order with
 * one line whose revision 1 was quoted and sent to them.
 */
export async function sentQuoteWorld(
  plant: Plant,
  opts: { terms?: 'deposit' | 'account'; send?: boolean } = {},
) {
  const customer = await createCustomer({ plant, terms: opts.terms ?? 'deposit' });
  const builder = await createUser({ role: 'builder', customer });
  const sales = await createUser({ role: 'sales', plant });
  const order = await createOrder({ job: await createJob({ customer }) });
  await createLine({ order, mark: 'T1' });
  const quote = await createQuote(sales, order);
  if (opts.send !== false) await sendQuote(sales, await order.reload(), quote);
  return { customer, builder, sales, order: await order.reload(), quote: await quote.reload() };
}
