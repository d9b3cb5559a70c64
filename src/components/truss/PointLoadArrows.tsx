import { toScreen, type ScreenTransform } from './geometry';
import type { DrawingModel } from './model';

const LENGTH = 34;

/** Downward arrows onto the chords where point loads act, each with its value above it. */
export function PointLoadArrows({
  loads,
  transform,
}: {
  loads: DrawingModel['pointLoads'];
  transform: ScreenTransform;
}) {
  if (!loads || loads.length === 0) return null;
  return (
    <g data-testid="point-load-arrows" className="fill-danger-700 stroke-danger-700">
      {loads.map((l, i) => {
        const p = toScreen(transform, l);
        // Clear the chord band: stop the head a little above the chord line.
        const tip = p.y - 5;
        return (
          <g key={i}>
            <line x1={p.x} y1={tip - LENGTH} x2={p.x} y2={tip - 6} strokeWidth={2} />
            <path d={`M ${p.x} ${tip} l -5 -8 h 10 z`} strokeWidth={1} />
            <text
              x={p.x}
              y={tip - LENGTH - 4}
              textAnchor="middle"
              // A white halo keeps the value readable over members and tags.
              stroke="white"
              strokeWidth={3}
              paintOrder="stroke"
              className="text-[11px] font-semibold"
            >
              {l.text}
            </text>
          </g>
        );
      })}
    </g>
  );
}
