import { orderStatusLabel } from '../../../../shared/api/orderStatus';
import { Card, EmptyState, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { useShopOrders } from '../api/list-shop-orders';

/** The foreman's list: orders whose designs are all approved, each opening its cut list. */
export function ShopOrdersPage() {
  const query = useShopOrders();
  return (
    <>
      <PageHeader
        title="Ready for the shop"
        description="Orders whose truss designs are all approved. Open one for its cut list."
      />
      <Card flush>
        <QueryState query={query} what="orders ready for the shop">
          {({ items }) =>
            items.length === 0 ? (
              <EmptyState title="No orders ready yet">
                An order appears here once the design reviewer has approved every truss on it.
              </EmptyState>
            ) : (
              <table className="w-full text-left text-base">
                <caption className="sr-only">Orders ready for the shop</caption>
                <thead className="border-b border-sand-200 text-sm text-sand-600">
                  <tr>
                    <th className="px-4 py-3 font-medium">Order</th>
                    <th className="px-4 py-3 font-medium">Job</th>
                    <th className="px-4 py-3 font-medium">Builder</th>
                    <th className="px-4 py-3 font-medium">Status</th>
                    <th className="px-4 py-3 text-right font-medium">Lines</th>
                    <th className="px-4 py-3 text-right font-medium">Trusses</th>
                    <th className="px-4 py-3 font-medium">Updated</th>
                  </tr>
                </thead>
                <tbody>
                  {items.map((o) => (
                    <tr key={o.id} className="border-b border-sand-100 last:border-0">
                      <td className="px-4 py-3 whitespace-nowrap">
                        <TextLink to={`/shop/orders/${o.id}`}>{o.number}</TextLink>
                      </td>
                      <td className="px-4 py-3">{o.job.name}</td>
                      <td className="px-4 py-3">{o.customer.name}</td>
                      <td className="px-4 py-3 whitespace-nowrap">{orderStatusLabel(o.status)}</td>
                      <td className="px-4 py-3 text-right tabular-nums">{o.lineCount}</td>
                      <td className="px-4 py-3 text-right tabular-nums">{o.trussCount}</td>
                      <td className="px-4 py-3 whitespace-nowrap text-sand-600">
                        {formatDate(o.updatedAt)}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )
          }
        </QueryState>
      </Card>
    </>
  );
}
