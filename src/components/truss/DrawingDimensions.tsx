import { chainDimensions, overallHeight, panelChain, pitchSymbol } from './dimensions';
import { jointIndex, toScreen, type Point, type ScreenTransform } from './geometry';
import type { DrawingModel } from './model';
import { formatLength, type PlantUnits } from './quantities';

/** Props of {@link DrawingDimensions}. */
export interface DrawingDimensionsProps {
  model: DrawingModel;
  units: PlantUnits;
  transform: ScreenTransform;
  tips: { side: 'left' | 'right'; heel: Point; tip: Point }[];
}

const TICK = 6;

/**
 * Panel-point chain and span/overhang chain below the bearings, heel height at the left, overall
 * height at the right, pitch symbol on the slope. Vertical dimensions read up, beside their lines,
 * so a long label is never cut by the drawing's edge.
 */
export function DrawingDimensions({ model, units, transform: t, tips }: DrawingDimensionsProps) {
  const base = toScreen(t, { x: 0, y: 0 });
  const panels = panelChain(model, units);
  const panelY = base.y + 42;
  const lineY = base.y + (panels.length > 0 ? 70 : 58);
  const lowestTip = Math.min(0, ...tips.map((x) => x.tip.y - base.y));
  const chain = chainDimensions(model, units);
  const pitch = pitchSymbol(model);
  const at = jointIndex(model.joints);
  // The pitch symbol sits above the left top chord, a quarter of the way up the slope.
  const leftTop = model.members.find((m) => m.role === 'topChord');
  const a = leftTop ? at.get(leftTop.from) : undefined;
  const b = leftTop ? at.get(leftTop.to) : undefined;
  const heelLeftX = Math.min(base.x, ...tips.filter((x) => x.side === 'left').map((x) => x.tip.x));
  const heelX = heelLeftX - 40;
  const heelTop = toScreen(t, { x: 0, y: model.heelHeight });
  const height = overallHeight(model);
  const rightX =
    Math.max(
      toScreen(t, { x: model.span, y: 0 }).x,
      ...tips.filter((x) => x.side === 'right').map((x) => x.tip.x),
    ) + 28;
  const top = toScreen(t, { x: 0, y: height });
  const bottomChord = new Set(
    model.members.filter((m) => m.role === 'bottomChord').flatMap((m) => [m.from, m.to]),
  );
  const panelJoints = model.joints.filter((j) => bottomChord.has(j.id));

  return (
    <g
      aria-hidden="true"
      className="fill-sand-700 stroke-sand-500 text-[12px]"
      pointerEvents="none"
    >
      {panels.map((seg) => {
        const x1 = toScreen(t, { x: seg.from, y: 0 }).x;
        const x2 = toScreen(t, { x: seg.to, y: 0 }).x;
        return (
          <g key={seg.key} data-dimension={seg.key}>
            <line x1={x1} y1={panelY} x2={x2} y2={panelY} strokeWidth={1} />
            <line x1={x1} y1={panelY - TICK} x2={x1} y2={panelY + TICK} strokeWidth={1} />
            <line x1={x2} y1={panelY - TICK} x2={x2} y2={panelY + TICK} strokeWidth={1} />
            <text
              x={(x1 + x2) / 2}
              y={panelY - 5}
              textAnchor="middle"
              stroke="none"
              className="text-[11px]"
            >
              {seg.label}
            </text>
          </g>
        );
      })}
      {panels.length > 0
        ? panelJoints.map((j) => {
            const p = toScreen(t, j);
            // Past the support symbols at the bearings, short dashes elsewhere.
            return (
              <line
                key={`ext-${j.id}`}
                x1={p.x}
                y1={p.y + (j.y === 0 ? 30 : 8)}
                x2={p.x}
                y2={panelY - TICK}
                strokeWidth={0.75}
                strokeDasharray="3 3"
              />
            );
          })
        : null}
      {chain.map((seg) => {
        const x1 = toScreen(t, { x: seg.from, y: 0 }).x;
        const x2 = toScreen(t, { x: seg.to, y: 0 }).x;
        return (
          <g key={seg.key} data-dimension={seg.key}>
            <line x1={x1} y1={lineY} x2={x2} y2={lineY} strokeWidth={1} />
            <line x1={x1} y1={lineY - TICK} x2={x1} y2={lineY + TICK} strokeWidth={1} />
            <line x1={x2} y1={lineY - TICK} x2={x2} y2={lineY + TICK} strokeWidth={1} />
            <line
              x1={x1}
              y1={base.y + 34 + lowestTip}
              x2={x1}
              y2={lineY - TICK}
              strokeWidth={0.75}
              strokeDasharray="3 3"
            />
            <text
              x={
                seg.key === 'overhangLeft'
                  ? x2 - 4
                  : seg.key === 'overhangRight'
                    ? x1 + 4
                    : (x1 + x2) / 2
              }
              y={lineY + 18}
              textAnchor={
                seg.key === 'overhangLeft'
                  ? 'end'
                  : seg.key === 'overhangRight'
                    ? 'start'
                    : 'middle'
              }
              stroke="none"
              className={seg.key === 'span' ? 'font-semibold' : undefined}
            >
              {seg.label}
            </text>
          </g>
        );
      })}
      {chain.length > 0 ? (
        <line
          x1={toScreen(t, { x: chain[chain.length - 1].to, y: 0 }).x}
          y1={base.y + 34 + lowestTip}
          x2={toScreen(t, { x: chain[chain.length - 1].to, y: 0 }).x}
          y2={lineY - TICK}
          strokeWidth={0.75}
          strokeDasharray="3 3"
        />
      ) : null}
      {model.heelHeight > 0 ? (
        <g data-dimension="heel">
          <line x1={heelX} y1={base.y} x2={heelX} y2={heelTop.y} strokeWidth={1} />
          <line x1={heelX - TICK} y1={base.y} x2={heelX + TICK} y2={base.y} strokeWidth={1} />
          <line x1={heelX - TICK} y1={heelTop.y} x2={heelX + TICK} y2={heelTop.y} strokeWidth={1} />
          <VerticalLabel x={heelX - 6} y={(base.y + heelTop.y) / 2}>
            {`heel ${formatLength(model.heelHeight, units)}`}
          </VerticalLabel>
        </g>
      ) : null}
      {height > 0 ? (
        <g data-dimension="height">
          <line x1={rightX} y1={base.y} x2={rightX} y2={top.y} strokeWidth={1} />
          <line x1={rightX - TICK} y1={base.y} x2={rightX + TICK} y2={base.y} strokeWidth={1} />
          <line x1={rightX - TICK} y1={top.y} x2={rightX + TICK} y2={top.y} strokeWidth={1} />
          <VerticalLabel x={rightX + 14} y={(base.y + top.y) / 2}>
            {`height ${formatLength(height, units)}`}
          </VerticalLabel>
        </g>
      ) : null}
      {pitch && a && b ? <PitchMark t={t} a={a} b={b} rise={pitch.rise} run={pitch.run} /> : null}
    </g>
  );
}

/** Text reading up, centred on (x, y): beside a vertical dimension line. */
function VerticalLabel({ x, y, children }: { x: number; y: number; children: string }) {
  return (
    <text
      x={x}
      y={y}
      textAnchor="middle"
      transform={`rotate(-90 ${x} ${y})`}
      stroke="none"
      className="text-[11px]"
    >
      {children}
    </text>
  );
}

function PitchMark(props: { t: ScreenTransform; a: Point; b: Point; rise: string; run: string }) {
  const { t, rise, run } = props;
  const [lo, hi] = props.a.x <= props.b.x ? [props.a, props.b] : [props.b, props.a];
  const pa = toScreen(t, lo);
  const pb = toScreen(t, hi);
  const along = 0.35;
  const p = { x: pa.x + (pb.x - pa.x) * along, y: pa.y + (pb.y - pa.y) * along };
  const slope = (pb.y - pa.y) / (pb.x - pa.x || 1);
  const run24 = 30;
  // A small right triangle above the chord: run along x, rise up, hypotenuse parallel to it.
  const x0 = p.x;
  const y0 = p.y - 34;
  const x1 = x0 + run24;
  const y1 = y0 + slope * run24;
  return (
    <g data-dimension="pitch" className="stroke-sand-700">
      <path d={`M ${x0} ${y0} L ${x1} ${y0} L ${x1} ${y1} Z`} fill="none" strokeWidth={1} />
      <text x={(x0 + x1) / 2} y={y0 + 13} textAnchor="middle" stroke="none" className="text-[11px]">
        {run}
      </text>
      <text x={x1 + 4} y={(y0 + y1) / 2 + 4} stroke="none" className="text-[11px]">
        {rise}
      </text>
    </g>
  );
}
