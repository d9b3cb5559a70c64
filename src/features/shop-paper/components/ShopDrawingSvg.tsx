import type { ShopDrawingGeometry } from '../../../../shared/api/shopPaper';

const W = 1000;

/**
 * The shop drawing of one truss to scale: lumber outlines (any polygons), plates over them,
 * piece marks, joint letters and dimension chains, drawn from the server's geometry (y up).
 */
export function ShopDrawingSvg({ geometry: g }: { geometry: ShopDrawingGeometry }) {
  const { minX, minY, maxX, maxY } = g.bounds;
  const k = W / (maxX - minX || 1);
  const H = (maxY - minY) * k;
  const px = (x: number) => (x - minX) * k;
  const py = (y: number) => H - (y - minY) * k;
  const d = (points: [number, number][]) =>
    `${points.map(([x, y], i) => `${i ? 'L' : 'M'}${px(x).toFixed(1)},${py(y).toFixed(1)}`).join('')}Z`;
  return (
    <svg
      viewBox={`-20 -10 ${W + 40} ${H + 20}`}
      role="img"
      aria-label="Shop drawing: member outlines, plates and dimensions"
      className="h-auto w-full"
      data-testid="shop-drawing"
    >
      {g.outlines.map((o, i) => (
        <path
          key={`o${i}`}
          d={d(o.points)}
          className="fill-timber-50 stroke-sand-900"
          strokeWidth={1}
        />
      ))}
      {g.plates.map((p) => (
        <path
          key={`p${p.joint}`}
          d={d(p.points)}
          className="fill-sand-400 stroke-sand-900"
          fillOpacity={0.6}
          strokeWidth={0.8}
        >
          <title>{`${p.joint}: ${p.plate}`}</title>
        </path>
      ))}
      {g.pieceLabels.map((l) => (
        <text
          key={`l${l.text}`}
          x={px(l.at[0])}
          y={py(l.at[1])}
          textAnchor="middle"
          dominantBaseline="central"
          className="fill-sand-900 text-[13px] font-bold"
          stroke="white"
          strokeWidth={4}
          paintOrder="stroke"
        >
          {l.text}
        </text>
      ))}
      {g.jointLabels.map((l) => (
        <text
          key={`j${l.text}`}
          x={px(l.at[0]) + 4}
          y={py(l.at[1]) + 12}
          className="fill-sand-600 text-[10px]"
        >
          {l.text}
        </text>
      ))}
      {g.dimensions.map((m, i) => {
        const y = py(m.from[1] + m.offset);
        const x0 = px(m.from[0]);
        const x1 = px(m.to[0]);
        return (
          <g key={`d${i}`} className="stroke-sand-600" strokeWidth={0.8}>
            <path
              d={`M${x0},${py(m.from[1])}V${y}M${x1},${py(m.to[1])}V${y}M${x0},${y}H${x1}`}
              fill="none"
            />
            <path d={`M${x0 - 4},${y + 4}l8,-8M${x1 - 4},${y + 4}l8,-8`} />
            <text
              x={(x0 + x1) / 2}
              y={y + (m.offset > 0 ? -5 : 13)}
              textAnchor="middle"
              className="fill-sand-700 stroke-none text-[12px] font-medium"
            >
              {m.text}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
