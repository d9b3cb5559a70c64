import type { ReactNode } from 'react';
import type { JointPlateRow } from '../../../../shared/api/shopPaper';

/** A link to a printed document (PDF, CSV) that the browser opens in a new tab. */
export function FileLink({ href, children }: { href: string; children: ReactNode }) {
  return (
    <a
      href={href}
      target="_blank"
      rel="noopener"
      className="inline-flex min-h-11 items-center rounded border border-sand-300 bg-white px-4 py-2 text-base font-medium text-timber-700 hover:bg-timber-50 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-focus"
    >
      {children}
    </a>
  );
}

/** Prints the page with the shop stylesheet (the browser's print dialog). */
export function PrintButton({ label = 'Print this page' }: { label?: string }) {
  return (
    <button
      type="button"
      data-print="hide"
      onClick={() => window.print()}
      className="inline-flex min-h-11 items-center rounded bg-timber-600 px-4 py-2 text-base font-medium text-white hover:bg-timber-700 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-focus"
    >
      {label}
    </button>
  );
}

/** A plain table for the shop: large enough to read at the table on a tablet. */
export function ShopTable({
  head,
  rows,
  right = [],
  caption,
}: {
  head: string[];
  rows: (string | number)[][];
  /** Column indexes aligned right (numbers). */
  right?: number[];
  caption?: string;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-base">
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        <thead className="bg-sand-100 text-sm text-sand-600">
          <tr>
            {head.map((h, i) => (
              <th
                key={h}
                scope="col"
                className={`px-3 py-2 font-medium ${right.includes(i) ? 'text-right' : ''}`}
              >
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, k) => (
            <tr key={k} className="border-t border-sand-200">
              {r.map((c, i) => (
                <td
                  key={i}
                  className={`px-3 py-2 ${right.includes(i) ? 'text-right tabular-nums' : ''}`}
                >
                  {c}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Joint plate rows as table cells: joint, plate, gauge, size, faces, axis, position. */
export const plateCells = (p: JointPlateRow) => [
  p.joint,
  p.plate,
  p.gauge,
  `${p.widthIn} × ${p.lengthIn} in`,
  p.faces,
  p.angleDeg === null ? '—' : `${p.angleDeg.toFixed(1)}°`,
  p.position,
];
export const PLATE_HEAD = ['Joint', 'Plate', 'Gauge', 'Size', 'Faces', 'Axis', 'Position'];

/** The cautions of DESIGN.md §4.6, as every shop page shows them. */
export function Cautions({ items }: { items: string[] }) {
  return (
    <section
      data-print="keep"
      aria-label="Cautions"
      className="mt-6 rounded-md border border-warning-200 bg-warning-50 p-4 text-sm text-sand-900"
    >
      <h2 className="mb-2 text-base font-semibold">Cautions</h2>
      <ul className="list-disc space-y-1 pl-5">
        {items.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </section>
  );
}
