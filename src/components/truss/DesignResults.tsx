import { memo, type ReactNode } from 'react';
import type { PresentedDesign, PresentedDeflection } from '../../../shared/engine/design';
import { Alert, Badge, Card } from '../ui';
import { csiBand, formatCsi } from './csi';
import { MemberTable } from './MemberTable';
import { PlyFastening } from './PlyFastening';
import { formatPresentedDeflection, formatPresentedForce } from './quantities';

const cell = 'px-4 py-2 align-top text-sand-800';
const head = 'px-4 py-2 text-left text-xs font-semibold tracking-wide text-sand-700 uppercase';

function SimpleTable({
  caption,
  headers,
  children,
}: {
  caption: string;
  headers: string[];
  children: ReactNode;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-sand-100">
          <tr>
            {headers.map((h) => (
              <th key={h} scope="col" className={head}>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-sand-200">{children}</tbody>
      </table>
    </div>
  );
}

const passBadge = (pass: boolean) => (
  <Badge tone={pass ? 'success' : 'danger'}>{pass ? 'Passes' : 'Fails'}</Badge>
);

/** Why a design fails, in one box: the count of failing members and each warning. */
export function DesignVerdict({ design }: { design: PresentedDesign }) {
  const failing = design.members.filter((m) => csiBand(m.csi).fails);
  const worst = Math.max(...design.members.map((m) => m.csi));
  if (design.ok) {
    return (
      <Alert tone="success" title="The design passes every check">
        Highest member CSI {formatCsi(worst)}; deflection, bearings and plates are within limits.
        {design.warnings.length > 0 ? (
          <ul className="mt-1 list-disc pl-5">
            {design.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        ) : null}
      </Alert>
    );
  }
  return (
    <Alert tone="danger" title="The design fails">
      {failing.length > 0 ? (
        <p>
          {failing.length} member{failing.length === 1 ? '' : 's'} over CSI 1.00:{' '}
          {failing.map((m) => `${m.id} (${formatCsi(m.csi)})`).join(', ')}.
        </p>
      ) : null}
      <ul className="mt-1 list-disc pl-5">
        {design.warnings.map((w) => (
          <li key={w}>{w}</li>
        ))}
      </ul>
    </Alert>
  );
}

function DeflectionRow({
  label,
  d,
  unit,
}: {
  label: string;
  d: PresentedDeflection;
  unit: 'in' | 'mm';
}) {
  return (
    <tr>
      <td className={cell}>
        {label} <span className="text-xs text-sand-600">({d.load})</span>
      </td>
      <td className={`${cell} whitespace-nowrap`}>
        {formatPresentedDeflection(d.max, unit)} at {d.joint}
      </td>
      <td className={cell}>{d.ratio === null ? 'no deflection' : `L/${d.ratio}`}</td>
      <td className={cell}>L/{d.limit}</td>
      <td className={cell}>{passBadge(d.pass)}</td>
    </tr>
  );
}

/** Reactions per support (max down, max up), bearing checks and deflection against limits. */
export function SupportsAndDeflection({ design }: { design: PresentedDesign }) {
  const f = design.units.force;
  const bearingOf = new Map(design.bearing.map((b) => [b.joint, b]));
  return (
    <div className="grid gap-4 2xl:grid-cols-2">
      <Card title="Reactions" flush className="break-inside-avoid">
        <SimpleTable
          caption="Reactions"
          headers={['Support', 'Max down', 'Max up', 'Bearing', 'Ratio', '']}
        >
          {design.reactions.map((r) => {
            const b = bearingOf.get(r.joint);
            return (
              <tr key={r.joint}>
                <td className={`${cell} font-semibold`}>{r.joint}</td>
                <td className={`${cell} whitespace-nowrap`}>
                  {formatPresentedForce(r.maxDown, f)}
                </td>
                <td className={`${cell} whitespace-nowrap`}>
                  {r.maxUp > 0 ? formatPresentedForce(r.maxUp, f) : '—'}
                </td>
                <td className={`${cell} whitespace-nowrap`}>{b ? b.width.text : '—'}</td>
                <td className={cell}>{b ? formatCsi(b.ratio) : '—'}</td>
                <td className={cell}>{b ? passBadge(b.pass) : null}</td>
              </tr>
            );
          })}
        </SimpleTable>
      </Card>
      <Card title="Deflection" flush className="break-inside-avoid">
        <SimpleTable caption="Deflection" headers={['Load', 'Largest', 'Span / Δ', 'Limit', '']}>
          {design.deflection.live ? (
            <DeflectionRow label="Live" d={design.deflection.live} unit={design.units.length} />
          ) : null}
          <DeflectionRow label="Total" d={design.deflection.total} unit={design.units.length} />
        </SimpleTable>
      </Card>
    </div>
  );
}

/**
 * Chord shear, long-term, mid-panel and overhang-tip deflection, uplift hold-downs and a
 * scissor's roller movement (absent on designs saved before these checks).
 */
export function AdditionalChecksCard({ design }: { design: PresentedDesign }) {
  const a = design.additional;
  if (!a) return null;
  const unit = design.units.length;
  const shear = a.shear.reduce<(typeof a.shear)[number] | undefined>(
    (w, s) => (!w || s.ratio > w.ratio ? s : w),
    undefined,
  );
  const rows: { label: string; d: PresentedDeflection }[] = [
    { label: 'Long-term (creep)', d: a.longTermDeflection },
    ...(a.midPanel.live ? [{ label: 'Mid-panel, live', d: a.midPanel.live }] : []),
    { label: 'Mid-panel, total', d: a.midPanel.total },
    ...(a.overhangTip?.live ? [{ label: 'Overhang tip, live', d: a.overhangTip.live }] : []),
    ...(a.overhangTip ? [{ label: 'Overhang tip, total', d: a.overhangTip.total }] : []),
  ];
  return (
    <Card title="More checks" flush className="break-inside-avoid">
      <SimpleTable caption="More checks" headers={['Check', 'Largest', 'Ratio', 'Limit', '']}>
        {shear ? (
          <tr>
            <td className={cell}>
              Chord shear <span className="text-xs text-sand-600">({shear.combination})</span>
            </td>
            <td className={`${cell} whitespace-nowrap`}>
              {formatPresentedForce(shear.shear, design.units.force)} in {shear.member}
            </td>
            <td className={cell}>{formatCsi(shear.ratio)}</td>
            <td className={cell}>fv ≤ Fv′</td>
            <td className={cell}>{passBadge(shear.pass)}</td>
          </tr>
        ) : null}
        {rows.map((r) => (
          <DeflectionRow key={r.label} label={r.label} d={r.d} unit={unit} />
        ))}
        {a.uplift.map((u) => (
          <tr key={u.joint}>
            <td className={cell}>
              Uplift at {u.joint} <span className="text-xs text-sand-600">({u.combination})</span>
            </td>
            <td className={`${cell} whitespace-nowrap`}>
              {formatPresentedForce(u.force, design.units.force)}
            </td>
            <td className={cell} colSpan={2}>
              Hold-down rated for at least this force
            </td>
            <td className={cell}>
              <Badge tone="warning">Hold-down</Badge>
            </td>
          </tr>
        ))}
        {a.rollerMovement ? (
          <tr>
            <td className={cell}>
              Roller {a.rollerMovement.joint} slides{' '}
              <span className="text-xs text-sand-600">({a.rollerMovement.load})</span>
            </td>
            <td className={`${cell} whitespace-nowrap`}>
              {formatPresentedDeflection(Math.abs(a.rollerMovement.movement), unit)}{' '}
              {a.rollerMovement.movement >= 0 ? 'outward' : 'inward'}
            </td>
            <td className={cell} colSpan={3}>
              The bearing must allow it
            </td>
          </tr>
        ) : null}
      </SimpleTable>
    </Card>
  );
}

/**
 * The plate chosen at each joint, what governs it (teeth by angle, steel tension, shear or
 * combined) and its worst ratio; demo catalogs say so.
 */
export function PlatesTable({ design }: { design: PresentedDesign }) {
  return (
    <Card title="Plates (both faces of each joint)" flush>
      {design.demoPlates ? (
        <p className="border-b border-sand-200 bg-warning-50 px-4 py-2 text-xs text-warning-800">
          Demo plate catalog: its design values are invented and are not for construction.
        </p>
      ) : null}
      <SimpleTable caption="Plates" headers={['Joint', 'Kind', 'Plate', 'Governs', 'Ratio', '']}>
        {design.plates.map((p) => (
          <tr key={p.joint}>
            <td className={`${cell} font-semibold`}>{p.joint}</td>
            <td className={cell}>{p.kind}</td>
            <td className={cell}>{p.plate ?? p.message ?? '—'}</td>
            <td className={cell}>{p.governs ?? '—'}</td>
            <td className={cell}>{formatCsi(p.ratio)}</td>
            <td className={cell}>{passBadge(p.ok)}</td>
          </tr>
        ))}
      </SimpleTable>
    </Card>
  );
}

/** The standing cautions (DESIGN.md §4.6) as the design carries them. */
export function DesignCautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <aside
      aria-labelledby="design-cautions-title"
      className="rounded-md border border-warning-200 bg-warning-50 px-4 py-3 text-warning-800"
    >
      <h2 id="design-cautions-title" className="text-sm font-semibold">
        Before anything is built
      </h2>
      <ul className="mt-1.5 list-disc space-y-1 pl-5 text-sm">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}

/**
 * Everything below the drawing: verdict, members, reactions and bearings, deflection, plates,
 * warnings, assumptions and the cautions.
 */
export const DesignResults = memo(function DesignResults({ design }: { design: PresentedDesign }) {
  return (
    <div className="flex flex-col gap-4 print:block print:space-y-3">
      <DesignVerdict design={design} />
      <Card title="Members" flush>
        <MemberTable design={design} />
      </Card>
      <SupportsAndDeflection design={design} />
      <AdditionalChecksCard design={design} />
      <PlatesTable design={design} />
      <PlyFastening design={design} />
      {design.notes.length > 0 ? (
        <Card title="Assumptions">
          <ul className="list-disc space-y-1 pl-5 text-sm text-sand-700">
            {design.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
          <p className="mt-2 text-xs text-sand-600">Engine version {design.engineVersion}</p>
        </Card>
      ) : null}
      <DesignCautions cautions={design.cautions} />
    </div>
  );
});
