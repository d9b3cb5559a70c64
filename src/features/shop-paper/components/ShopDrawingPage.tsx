import { Card, QueryState, TextLink } from '../../../components/ui';
import { shopPaperFiles } from '../api/files';
import { useShopDrawing } from '../api/get-drawing';
import { Cautions, FileLink, PLATE_HEAD, PrintButton, ShopTable, plateCells } from './parts';
import { ShopDrawingSvg } from './ShopDrawingSvg';
import './shop-paper.css';

/**
 * One truss mark's shop drawing, readable at the table on a tablet and printable: the drawing,
 * the piece list, the plate list and the cautions. `truss` is the tag's "n" when opened from a
 * tag's QR code.
 */
export function ShopDrawingPage({
  orderId,
  lineId,
  truss,
}: {
  orderId: number;
  lineId: number;
  truss?: number;
}) {
  const query = useShopDrawing(orderId, lineId);
  return (
    <QueryState query={query} what="the shop drawing">
      {(s) => (
        <article data-print="sheet">
          <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
            <div>
              <h1 className="text-2xl font-semibold tracking-tight text-sand-900">
                {s.mark}{' '}
                <span className="text-lg font-medium text-sand-700">
                  {s.description} · {s.quantity} truss{s.quantity === 1 ? '' : 'es'} · {s.plies}{' '}
                  {s.plies === 1 ? 'ply' : 'plies'}
                </span>
              </h1>
              <p className="mt-1 text-base text-sand-600">
                Order {s.order.number} · {s.order.job.name} · {s.order.builder.name}
                {truss ? ` · truss ${truss} of ${s.quantity}` : ''}
              </p>
              <p className="text-base text-sand-600">
                Span {s.span} · Pitch {s.pitch} · Rise {s.rise} · Heel {s.heelHeight}
              </p>
            </div>
            <div className="flex flex-wrap items-center gap-2" data-print="hide">
              <TextLink to={`/orders/${orderId}/shop-paper`}>All shop paper</TextLink>
              <FileLink href={shopPaperFiles(orderId).drawingPdf(lineId)}>PDF</FileLink>
              <PrintButton label="Print shop drawing" />
            </div>
          </div>
          <Card className="mb-4">
            <ShopDrawingSvg geometry={s.geometry} />
            <p className="mt-2 text-sm text-sand-600">
              Dimensions to panel points, centre lines, feet-inches-sixteenths; piece outlines and
              lengths as cut (long point).
            </p>
          </Card>
          <div className="grid gap-4 xl:grid-cols-2 print:grid-cols-1">
            <Card title="Pieces" flush>
              <ShopTable
                caption={`Pieces of ${s.mark}`}
                head={['Piece', 'Lumber', 'Length', 'Per truss']}
                right={[2, 3]}
                rows={s.pieces.map((p) => [p.mark, p.lumber, p.length, p.count])}
              />
            </Card>
            <Card title="Plates (both faces)" flush>
              <ShopTable
                caption={`Plates of ${s.mark}`}
                head={PLATE_HEAD}
                right={[2, 4, 5]}
                rows={s.plates.map(plateCells)}
              />
            </Card>
          </div>
          <p className="mt-4 text-base text-sand-700">
            {s.bracing.length
              ? `Bracing: ${s.bracing.join('; ')}`
              : 'No web bracing required by the design.'}
          </p>
          {s.demoPlates ? (
            <p className="text-sm text-warning-800">
              Demo plate catalog: its design values are invented.
            </p>
          ) : null}
          <Cautions items={s.cautions} />
        </article>
      )}
    </QueryState>
  );
}
