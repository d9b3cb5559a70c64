import clsx from 'clsx';
import { useMemo } from 'react';
import type { PresentedDesign } from '../../../shared/engine/design';
import { DataTable, tableColumnHelper, type TableColumn } from '../ui';
import { csiBand, formatCsi } from './csi';
import { forceSense, formatPresentedForce } from './quantities';

type Row = PresentedDesign['members'][number] & { governingForce: number | undefined };

const column = tableColumnHelper<Row>();

/** CSI as a small badge in the ramp's colour; failing members also say "fails". */
export function CsiBadge({ csi }: { csi: number }) {
  const band = csiBand(csi);
  return (
    <span className="inline-flex items-center gap-1.5 font-medium tabular-nums">
      <svg width="12" height="12" aria-hidden="true">
        <rect width="12" height="12" rx="2" className={clsx(band.fill, 'stroke-sand-800')} />
      </svg>
      {formatCsi(csi)}
      {band.fails ? <span className="text-danger-700">fails</span> : null}
    </span>
  );
}

const ROLE_NAMES: Record<string, string> = {
  topChord: 'Top chord',
  bottomChord: 'Bottom chord',
  web: 'Web',
};

function columnsFor(unit: 'lbf' | 'kN'): TableColumn<Row>[] {
  return column.columns([
    // The member's joints, then the piece it is cut from: one column keeps the table narrow.
    column.accessor('id', {
      header: 'Member',
      cell: (info) => (
        <span className="whitespace-nowrap">
          <span className="font-semibold text-sand-900">{info.getValue()}</span>
          <span className="block text-xs text-sand-600">
            {info.row.original.piece} · {ROLE_NAMES[info.row.original.role] ?? ''}
          </span>
        </span>
      ),
    }),
    column.accessor('lumber', {
      header: 'Lumber',
      cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
    }),
    // Centre-line length between panel points, as the design stores it (feet-inches or mm).
    column.accessor((r) => r.length.text, {
      id: 'length',
      header: 'Length',
      cell: (info) => <span className="whitespace-nowrap tabular-nums">{info.getValue()}</span>,
    }),
    column.accessor('governingForce', {
      header: 'Force',
      cell: (info) => {
        const f = info.getValue();
        if (f === undefined) return '—';
        const sense = forceSense(f);
        return (
          <span className="whitespace-nowrap tabular-nums">
            {formatPresentedForce(f, unit)}{' '}
            <span className="font-semibold">{sense === 'T' ? 'T' : sense === 'C' ? 'C' : ''}</span>
          </span>
        );
      },
    }),
    column.accessor('csi', { header: 'CSI', cell: (info) => <CsiBadge csi={info.getValue()} /> }),
    // Bracing sits under the governing check so the table fits the editor's column.
    column.accessor('governingCheck', {
      header: 'Governs · bracing',
      cell: (info) => {
        const m = info.row.original;
        return (
          <span className="block min-w-44">
            {info.getValue()}
            <span className="block text-xs text-sand-600">{m.governingCombination}</span>
            <span
              className={clsx(
                'mt-0.5 block text-xs',
                m.braced ? 'font-semibold text-sand-900' : 'text-sand-600',
              )}
            >
              {m.bracing}
            </span>
          </span>
        );
      },
    }),
  ]);
}

/**
 * Every member of a design: piece, lumber, governing force with T/C (tension positive in the
 * engine), CSI, governing check and combination, bracing.
 */
export function MemberTable({ design }: { design: PresentedDesign }) {
  const unit = design.units.force;
  const columns = useMemo(() => columnsFor(unit), [unit]);
  const rows = useMemo<Row[]>(() => {
    const names = design.combinations.map((c) => c.name);
    return design.members.map((m) => {
      const k = names.indexOf(m.governingCombination);
      return { ...m, governingForce: k >= 0 ? m.forces[k] : undefined };
    });
  }, [design]);
  return (
    <DataTable
      caption="Members"
      columns={columns}
      data={rows}
      rowKey={(m) => m.id}
      rowClassName={(m) => (csiBand(m.csi).fails ? 'bg-danger-50' : 'hover:bg-sand-50')}
    />
  );
}
