import { Card, QueryState, TextLink } from '../../../components/ui';
import { shopPaperFiles } from '../api/files';
import { useDeliveryTicket } from '../api/get-delivery';
import { Cautions, FileLink, PrintButton, ShopTable } from './parts';
import './shop-paper.css';

/** The delivery ticket as a printable page: site, builder, bundles, counts and signatures. */
export function DeliveryTicketPage({ orderId }: { orderId: number }) {
  const query = useDeliveryTicket(orderId);
  return (
    <QueryState query={query} what="the delivery ticket">
      {(t) => (
        <article>
          <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
            <div>
              <h1 className="text-2xl font-semibold tracking-tight text-sand-900">
                Delivery ticket · Order {t.order.number}
              </h1>
              <p className="mt-1 text-base text-sand-600">{t.order.plant}</p>
            </div>
            <div className="flex flex-wrap items-center gap-2" data-print="hide">
              <TextLink to={`/orders/${orderId}/shop-paper`}>All shop paper</TextLink>
              <FileLink href={shopPaperFiles(orderId).deliveryPdf}>PDF</FileLink>
              <PrintButton label="Print delivery ticket" />
            </div>
          </div>
          <div className="mb-4 grid gap-4 sm:grid-cols-2 print:grid-cols-2">
            <Card title="Deliver to (job site)">
              <p className="text-base font-medium">{t.order.job.name}</p>
              <p className="whitespace-pre-line text-base">{t.order.job.address}</p>
            </Card>
            <Card title="Builder">
              <p className="text-base font-medium">{t.order.builder.name}</p>
            </Card>
          </div>
          <Card title={`Bundles — ${t.bundles.length}`} className="mb-4" flush>
            <ShopTable
              caption="Bundles"
              head={['Bundle', 'Mark', 'Truss', 'Trusses', 'Count', 'Weight']}
              right={[0, 4, 5]}
              rows={t.bundles.map((b) => [
                b.number,
                b.mark,
                b.description,
                b.trusses,
                b.count,
                b.weight.text,
              ])}
            />
          </Card>
          <Card title="Marks and counts" className="mb-4" flush>
            <ShopTable
              caption="Marks and counts"
              head={['Mark', 'Truss', 'Count']}
              right={[2]}
              rows={[
                ...t.marks.map((m) => [m.mark, m.description, m.count]),
                ['', `Total (${t.totalWeight.text})`, t.totalTrusses],
              ]}
            />
            <p className="px-4 py-3 text-sm text-sand-600">{t.bundleRule}</p>
          </Card>
          <Cautions items={t.cautions} />
          <section data-print="keep" className="mt-8" aria-label="Received by">
            <h2 className="mb-6 text-base font-semibold">
              Received in good order (count checked against this ticket)
            </h2>
            <div className="grid grid-cols-3 gap-6">
              {['Received by (print name)', 'Signature', 'Date and time'].map((l) => (
                <div key={l} className="border-t border-sand-900 pt-1 text-sm text-sand-600">
                  {l}
                </div>
              ))}
            </div>
          </section>
        </article>
      )}
    </QueryState>
  );
}
