import type { Order, Quote, User } from '../../models';
import { acceptRefusal, findAcceptance, isExpired } from '../../commands/acceptance';
import { presentBuilderQuote } from '../../presenters/portal';

/** The builder's view of one sent revision: can it be accepted now, and was it? */
export async function builderQuote(order: Order, quote: Quote, superseded: boolean, viewer: User) {
  const acceptance = await findAcceptance(order.id);
  return presentBuilderQuote(
    quote,
    superseded,
    viewer,
    acceptance ? 'This order has been accepted.' : await acceptRefusal(order, quote),
    isExpired(quote),
    acceptance,
  );
}
