/**
 * The builder's order and quote pages (the home loads on its own), composed from the portal and payments features. Loaded lazily
 * (portal-routes.tsx), so a builder's phone never downloads the desk's pages or the truss editor.
 */
import { useParams } from 'react-router';
import { PortalOrderPage } from '../features/portal/components/PortalOrderPage';
import { BuilderQuotePage } from '../features/portal/components/BuilderQuotePage';
import { PaymentsCard } from '../features/payments/components/PaymentsCard';

const num = (v: string | undefined) => {
  const n = Number(v);
  if (!Number.isInteger(n) || n < 1) throw new Response('No such record.', { status: 404 });
  return n;
};

export function PortalOrderRoute() {
  const { id } = useParams();
  return <PortalOrderPage id={num(id)} payments={(order) => <PaymentsCard order={order} />} />;
}

export function BuilderQuoteRoute() {
  const { id, number } = useParams();
  return <BuilderQuotePage orderId={num(id)} number={num(number)} />;
}
