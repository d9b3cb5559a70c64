import { Card, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { shopPaperFiles } from '../api/files';
import { usePlateSchedule } from '../api/get-plates';
import { Cautions, FileLink, PLATE_HEAD, PrintButton, ShopTable, plateCells } from './parts';
import './shop-paper.css';

/** An order's shop paper: what to print, the marks, the plate schedule and the rack totals. */
export function ShopPaperPage({ orderId }: { orderId: number }) {
  const query = usePlateSchedule(orderId);
  const files = shopPaperFiles(orderId);
  return (
    <QueryState query={query} what="the shop paper">
      {(s) => (
        <>
          <PageHeader
            title={`Shop paper · Order ${s.order.number}`}
            description={`${s.order.job.name} · ${s.order.builder.name}`}
            actions={
              <div className="flex gap-2" data-print="hide">
                <TextLink to={`/orders/${orderId}`}>Back to the order</TextLink>
                <PrintButton label="Print plate schedule" />
              </div>
            }
          />
          <Card title="Print" className="mb-6">
            <div className="flex flex-wrap gap-3" data-print="hide">
              <FileLink href={files.tagsPdf('sheet')}>Truss tags — label sheet (4 × 2 in)</FileLink>
              <FileLink href={files.tagsPdf('label')}>
                Truss tags — label printer (4 × 6 in)
              </FileLink>
              <FileLink href={files.drawingsPdf}>Shop drawings (PDF)</FileLink>
              <FileLink href={files.platesPdf}>Plate schedule (PDF)</FileLink>
              <FileLink href={files.platesCsv}>Plate schedule (CSV)</FileLink>
              <FileLink href={files.deliveryPdf}>Delivery ticket (PDF)</FileLink>
              <TextLink to={`/orders/${orderId}/shop-paper/delivery`} className="self-center">
                Delivery ticket page
              </TextLink>
            </div>
          </Card>
          <Card title="Trusses" className="mb-6" flush>
            <ul className="divide-y divide-sand-200">
              {s.marks.map((m) => (
                <li
                  key={m.lineId}
                  className="flex flex-wrap items-center justify-between gap-3 px-4 py-3"
                >
                  <span className="text-base">
                    <strong className="mr-2 text-lg">{m.mark}</strong>
                    {m.description} · {m.quantity} × {m.plies} {m.plies === 1 ? 'ply' : 'plies'}
                  </span>
                  <TextLink to={`/orders/${orderId}/shop-paper/lines/${m.lineId}`}>
                    Shop drawing {m.mark}
                  </TextLink>
                </li>
              ))}
            </ul>
          </Card>
          <Card title={`Pick from the rack — ${s.totalPlates} plates`} className="mb-6" flush>
            <ShopTable
              caption="Plates to pick for the order"
              head={['Plate', 'Gauge', 'Size', 'Count']}
              right={[1, 3]}
              rows={s.totals.map((t) => [
                t.plate,
                t.gauge,
                `${t.widthIn} × ${t.lengthIn} in`,
                t.count,
              ])}
            />
            <p className="px-4 py-3 text-sm text-sand-600">{s.rule}</p>
            {s.demoPlates ? (
              <p className="px-4 pb-3 text-sm text-warning-800">
                Demo plate catalog: its design values are invented.
              </p>
            ) : null}
          </Card>
          {s.marks.map((m) => (
            <Card key={m.lineId} title={`${m.mark} — plates per joint`} className="mb-6" flush>
              <p className="px-4 pt-3 text-sm text-sand-600">
                {m.description} · per truss:{' '}
                {m.perTruss.map((c) => `${c.count} × ${c.plate}`).join(', ')}
              </p>
              <div data-print="keep">
                <ShopTable
                  caption={`Plates of ${m.mark}`}
                  head={PLATE_HEAD}
                  right={[2, 4, 5]}
                  rows={m.joints.map(plateCells)}
                />
              </div>
            </Card>
          ))}
          <Cautions items={s.cautions} />
        </>
      )}
    </QueryState>
  );
}
