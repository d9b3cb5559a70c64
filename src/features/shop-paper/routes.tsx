import type { QueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type RouteObject } from 'react-router';
import { SHOP_PAPER_ROLES } from '../../../shared/api/shopPaper';
import { requireRole } from '../../app/guards';
import { Alert, PageHeader } from '../../components/ui';

const positive = (v: string | null | undefined) => {
  const n = Number(v);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

function NoSuchPage() {
  return (
    <>
      <PageHeader title="Shop paper not found" />
      <Alert tone="warning">This address names no order or truss. Open it from the order.</Alert>
    </>
  );
}

/**
 * Routes of the shop paper, relative to the signed-in frame, for the foreman, the sales desk and
 * the plant manager: an order's shop paper, a mark's shop drawing (where a tag's QR code leads)
 * and the delivery ticket. Pages load lazily: only these roles ever download them.
 */
export function shopPaperRoutes(queryClient: QueryClient): RouteObject[] {
  const loader = async ({ request }: { request: Request }) => {
    await requireRole(queryClient, request, SHOP_PAPER_ROLES);
    return null;
  };
  return [
    {
      path: 'orders/:orderId/shop-paper',
      loader,
      lazy: async () => {
        const { ShopPaperPage } = await import('./components/ShopPaperPage');
        return {
          Component: function ShopPaperRoute() {
            const orderId = positive(useParams().orderId);
            return orderId ? <ShopPaperPage key={orderId} orderId={orderId} /> : <NoSuchPage />;
          },
        };
      },
    },
    {
      path: 'orders/:orderId/shop-paper/delivery',
      loader,
      lazy: async () => {
        const { DeliveryTicketPage } = await import('./components/DeliveryTicketPage');
        return {
          Component: function DeliveryRoute() {
            const orderId = positive(useParams().orderId);
            return orderId ? (
              <DeliveryTicketPage key={orderId} orderId={orderId} />
            ) : (
              <NoSuchPage />
            );
          },
        };
      },
    },
    {
      path: 'orders/:orderId/shop-paper/lines/:lineId',
      loader,
      lazy: async () => {
        const { ShopDrawingPage } = await import('./components/ShopDrawingPage');
        return {
          Component: function ShopDrawingRoute() {
            const params = useParams();
            const [search] = useSearchParams();
            const orderId = positive(params.orderId);
            const lineId = positive(params.lineId);
            if (!orderId || !lineId) return <NoSuchPage />;
            return (
              <ShopDrawingPage
                key={`${orderId}/${lineId}`}
                orderId={orderId}
                lineId={lineId}
                truss={positive(search.get('truss'))}
              />
            );
          },
        };
      },
    },
  ];
}
