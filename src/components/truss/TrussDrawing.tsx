import clsx from 'clsx';
import { memo, useId, useMemo, useState } from 'react';
import { CSI_BANDS, csiBand, formatCsi } from './csi';
import { DrawingDimensions } from './DrawingDimensions';
import {
  bandWidthPx,
  drawingBounds,
  drawingCentre,
  fitTransform,
  jointIndex,
  labelOffset,
  midpoint,
  overhangTips,
  toScreen,
  type Margins,
  type Point,
} from './geometry';
import type { DrawingMember, DrawingModel } from './model';
import { PointLoadArrows } from './PointLoadArrows';
import { formatAxialForce, forceSense, type PlantUnits } from './quantities';

/** Props of {@link TrussDrawing}. */
export interface TrussDrawingProps {
  model: DrawingModel;
  units: PlantUnits;
  /** Accessible name and `<title>`, e.g. "Fink truss, span 28'-0", pitch 6/12". */
  title: string;
  /** True while the input is invalid: the last good drawing stays, dimmed, with `staleNote`. */
  stale?: boolean;
  staleNote?: string;
  /**
   * Time of the last engine run, ms, exposed as `data-engine-ms` and as the first value of
   * `data-design-ms` (the editor overwrites the latter with keystroke-to-drawing time).
   */
  designMs?: number;
}

const WIDTH = 960;
const HEIGHT = 440;
// Room below for the panel-point and span chains, left for the heel height, right for the
// overall height, above for labels.
const MARGINS: Margins = { top: 48, right: 64, bottom: 104, left: 84 };

interface PlacedMember {
  member: DrawingMember;
  a: Point;
  b: Point;
  width: number;
}

/** What a screen reader hears on a member: id, force with T/C, lumber and CSI. */
function memberSummary(member: DrawingMember, units: PlantUnits): string {
  const parts = [`Member ${member.id}`];
  if (member.force !== undefined) parts.push(formatAxialForce(member.force, units));
  if (member.lumber) parts.push(member.lumber);
  if (member.csi !== undefined) parts.push(`CSI ${formatCsi(member.csi)}`);
  return parts.join(', ');
}

function MemberBand({
  placed,
  units,
  onHover,
}: {
  placed: PlacedMember;
  units: PlantUnits;
  onHover: (id: string | null) => void;
}) {
  const { member, a, b, width } = placed;
  const hasResult = member.csi !== undefined;
  const band = hasResult ? csiBand(member.csi!) : undefined;
  const sense = member.force === undefined ? '—' : forceSense(member.force);
  const line = { x1: a.x, y1: a.y, x2: b.x, y2: b.y };
  return (
    <g
      tabIndex={0}
      role="img"
      aria-label={memberSummary(member, units)}
      onMouseEnter={() => onHover(member.id)}
      onMouseLeave={() => onHover(null)}
      onFocus={() => onHover(member.id)}
      onBlur={() => onHover(null)}
      className="cursor-pointer outline-none"
      data-member={member.id}
    >
      <line {...line} className="stroke-sand-800" strokeWidth={width + 2} />
      <line {...line} className={band ? band.stroke : 'stroke-timber-200'} strokeWidth={width} />
      {band?.fails ? <line {...line} stroke="url(#truss-fail-hatch)" strokeWidth={width} /> : null}
      {sense === 'C' ? (
        <line {...line} className="stroke-sand-900" strokeWidth={1.25} strokeDasharray="6 4" />
      ) : null}
      {/* A wide invisible stroke makes thin members easy to point at. */}
      <line {...line} stroke="transparent" strokeWidth={Math.max(width, 14)} />
    </g>
  );
}

function ForceTag({ placed }: { placed: PlacedMember }) {
  const sense = placed.member.force === undefined ? '—' : forceSense(placed.member.force);
  if (sense === '—') return null;
  const m = midpoint(placed.a, placed.b);
  return (
    <g pointerEvents="none" aria-hidden="true">
      <rect
        x={m.x - 7}
        y={m.y - 7}
        width={14}
        height={14}
        rx={3}
        className={sense === 'C' ? 'fill-sand-900' : 'fill-white stroke-sand-800'}
      />
      <text
        x={m.x}
        y={m.y + 4}
        textAnchor="middle"
        className={clsx('text-[10px] font-bold', sense === 'C' ? 'fill-white' : 'fill-sand-900')}
      >
        {sense}
      </text>
    </g>
  );
}

function Tooltip({ placed, units }: { placed: PlacedMember; units: PlantUnits }) {
  const { member } = placed;
  const m = midpoint(placed.a, placed.b);
  const left = `${(m.x / WIDTH) * 100}%`;
  const top = `${(m.y / HEIGHT) * 100}%`;
  return (
    <div
      role="tooltip"
      className="pointer-events-none absolute z-10 w-60 -translate-x-1/2 -translate-y-[calc(100%+12px)] rounded border border-sand-300 bg-white px-3 py-2 text-xs text-sand-800 shadow-dialog"
      style={{ left, top }}
    >
      <p className="text-sm font-semibold text-sand-900">
        Member {member.id}
        {member.piece ? (
          <span className="font-normal text-sand-600"> · piece {member.piece}</span>
        ) : null}
      </p>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-2 gap-y-0.5">
        <dt className="text-sand-600">Force</dt>
        <dd>{formatAxialForce(member.force, units)}</dd>
        <dt className="text-sand-600">Lumber</dt>
        <dd>{member.lumber ?? '—'}</dd>
        <dt className="text-sand-600">CSI</dt>
        <dd>{formatCsi(member.csi)}</dd>
        <dt className="text-sand-600">Governs</dt>
        <dd>{member.combination ? `${member.combination}, ${member.check ?? ''}` : '—'}</dd>
      </dl>
    </div>
  );
}

/** The colour ramp, the tension/compression marks and the failing hatch, as a key. */
export function DrawingLegend({ withResults }: { withResults: boolean }) {
  if (!withResults) {
    return (
      <p className="text-xs text-sand-600">Geometry only: forces appear once the design runs.</p>
    );
  }
  return (
    <ul
      aria-label="Drawing key"
      className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs text-sand-700"
    >
      <li className="font-medium text-sand-800">Stress index (CSI)</li>
      {CSI_BANDS.map((band) => (
        <li key={band.id} className="flex items-center gap-1.5">
          <svg width="22" height="10" aria-hidden="true">
            <rect width="22" height="10" rx="2" className={clsx(band.fill, 'stroke-sand-800')} />
            {band.fails ? <rect width="22" height="10" fill="url(#truss-fail-hatch-key)" /> : null}
          </svg>
          {band.label}
        </li>
      ))}
      <li className="flex items-center gap-1.5">
        <span className="rounded-sm border border-sand-800 bg-white px-1 font-bold text-sand-900">
          T
        </span>
        tension (solid)
      </li>
      <li className="flex items-center gap-1.5">
        <span className="rounded-sm bg-sand-900 px-1 font-bold text-white">C</span>
        compression (dashed centre line)
      </li>
    </ul>
  );
}

/**
 * The truss drawing: members as lumber-width bands shaded by CSI, T/C tags, joint letters,
 * supports, span/heel/overhang dimensions and the pitch symbol; a tooltip per member on hover or
 * focus. Pure SVG from the model, memoised, so a redraw costs only the changed props.
 */
export const TrussDrawing = memo(function TrussDrawing({
  model,
  units,
  title,
  stale = false,
  staleNote,
  designMs,
}: TrussDrawingProps) {
  const [hover, setHover] = useState<string | null>(null);
  const titleId = useId();
  const layout = useMemo(() => {
    // Room above for the arrows and values of top-chord point loads.
    const top = model.pointLoads?.some((l) => l.chord === 'top') ? 76 : MARGINS.top;
    const t = fitTransform(drawingBounds(model), WIDTH, HEIGHT, { ...MARGINS, top });
    const at = jointIndex(model.joints);
    const members: PlacedMember[] = model.members.flatMap((member) => {
      const from = at.get(member.from);
      const to = at.get(member.to);
      if (!from || !to) return [];
      return [
        {
          member,
          a: toScreen(t, from),
          b: toScreen(t, to),
          width: bandWidthPx(member.lumber, t.scale),
        },
      ];
    });
    const centre = toScreen(t, drawingCentre(model));
    // T/C tags sit at member midpoints; a joint letter that would touch one moves farther out.
    const tags = members
      .filter((m) => m.member.force !== undefined && forceSense(m.member.force) !== '—')
      .map((m) => midpoint(m.a, m.b));
    const joints = model.joints.map((j) => {
      const p = toScreen(t, j);
      const place = (d: number) => {
        const o = labelOffset(p, centre, d);
        return { x: p.x + o.x, y: p.y + o.y };
      };
      const clear = (l: Point) =>
        tags.every((g) => Math.abs(g.x - l.x) > 14 || Math.abs(g.y - l.y) > 15);
      const label = [15, 24, 33].map(place).find(clear) ?? place(15);
      return { id: j.id, p, label };
    });
    const tips = overhangTips(model).map((tip) => ({
      side: tip.side,
      heel: toScreen(t, tip.heel),
      tip: toScreen(t, tip.tip),
    }));
    const supports = model.supports.flatMap((s) => {
      const j = at.get(s.joint);
      return j ? [{ ...s, p: toScreen(t, j) }] : [];
    });
    return { t, members, joints, tips, supports };
  }, [model]);
  const hovered = layout.members.find((m) => m.member.id === hover);
  const withResults = model.members.some((m) => m.csi !== undefined);
  const chordWidth = layout.members.find((m) => m.member.role === 'topChord')?.width ?? 4;

  return (
    <figure className="flex flex-col gap-2">
      <div className={clsx('relative', stale && 'opacity-40')}>
        <svg
          data-testid="truss-drawing"
          data-design-ms={designMs === undefined ? undefined : designMs.toFixed(2)}
          data-engine-ms={designMs === undefined ? undefined : designMs.toFixed(2)}
          data-stale={stale || undefined}
          viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
          // A group, not an image: its members are focusable and name their own results.
          role="group"
          aria-labelledby={titleId}
          aria-label={title}
          className="h-auto w-full select-none"
        >
          <title id={titleId}>{title}</title>
          <defs>
            <pattern
              id="truss-fail-hatch"
              width="6"
              height="6"
              patternUnits="userSpaceOnUse"
              patternTransform="rotate(45)"
            >
              <line x1="0" y1="0" x2="0" y2="6" className="stroke-white" strokeWidth="2" />
            </pattern>
            <pattern
              id="truss-fail-hatch-key"
              width="5"
              height="5"
              patternUnits="userSpaceOnUse"
              patternTransform="rotate(45)"
            >
              <line x1="0" y1="0" x2="0" y2="5" className="stroke-white" strokeWidth="1.5" />
            </pattern>
          </defs>
          {layout.supports.map((s) => (
            <g key={s.joint} aria-hidden="true" className="fill-sand-300 stroke-sand-700">
              <path d={`M ${s.p.x} ${s.p.y + 4} l -11 18 h 22 z`} strokeWidth={1.5} />
              {s.type === 'roller' ? (
                <line
                  x1={s.p.x - 15}
                  y1={s.p.y + 27}
                  x2={s.p.x + 15}
                  y2={s.p.y + 27}
                  strokeWidth={1.5}
                />
              ) : (
                <line
                  x1={s.p.x - 15}
                  y1={s.p.y + 23}
                  x2={s.p.x + 15}
                  y2={s.p.y + 23}
                  strokeWidth={3}
                />
              )}
            </g>
          ))}
          {layout.tips.map((tip) => (
            <g key={tip.side} aria-hidden="true">
              <line
                x1={tip.heel.x}
                y1={tip.heel.y}
                x2={tip.tip.x}
                y2={tip.tip.y}
                className="stroke-sand-800"
                strokeWidth={chordWidth + 2}
              />
              <line
                x1={tip.heel.x}
                y1={tip.heel.y}
                x2={tip.tip.x}
                y2={tip.tip.y}
                className="stroke-timber-200"
                strokeWidth={chordWidth}
              />
            </g>
          ))}
          {layout.members.map((placed) => (
            <MemberBand key={placed.member.id} placed={placed} units={units} onHover={setHover} />
          ))}
          {layout.members.map((placed) => (
            <ForceTag key={placed.member.id} placed={placed} />
          ))}
          {layout.joints.map((j) => (
            <g key={j.id} aria-hidden="true" pointerEvents="none">
              <circle
                cx={j.p.x}
                cy={j.p.y}
                r={3.5}
                className="fill-white stroke-sand-900"
                strokeWidth={1.5}
              />
              <text
                x={j.label.x}
                y={j.label.y + 4}
                textAnchor="middle"
                className="fill-timber-800 text-[12px] font-semibold"
              >
                {j.id}
              </text>
            </g>
          ))}
          <DrawingDimensions model={model} units={units} transform={layout.t} tips={layout.tips} />
          <PointLoadArrows loads={model.pointLoads} transform={layout.t} />
        </svg>
        {hovered && !stale ? <Tooltip placed={hovered} units={units} /> : null}
      </div>
      {stale ? (
        <p role="status" className="text-sm text-warning-800">
          {staleNote ?? 'Showing the last valid truss; fix the highlighted fields to update it.'}
        </p>
      ) : null}
      <DrawingLegend withResults={withResults} />
    </figure>
  );
});
