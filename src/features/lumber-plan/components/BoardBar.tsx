import type { LumberPlanSection } from '../../../../shared/api/lumberPlan';
import { formatFeetInches } from '../../../../shared/engine/format';
import { mm, MM_PER_INCH } from '../../../../shared/engine/units';

type Board = NonNullable<LumberPlanSection['plan']>['boards'][number];

export const feetInches = (inches: number) => formatFeetInches(mm(inches * MM_PER_INCH));

/** One board drawn to scale against the longest stock: pieces, then the offcut. */
export function BoardBar({ board, longestFt }: { board: Board; longestFt: number }) {
  const total = longestFt * 12;
  return (
    <div className="board-row flex items-center gap-3 py-1">
      <span className="w-12 shrink-0 text-right text-sm font-semibold tabular-nums">
        × {board.count}
      </span>
      <div className="min-w-0 flex-1">
        <div
          className="flex h-7 overflow-hidden rounded-sm border border-sand-400 bg-sand-100"
          style={{ width: `${((board.lengthFt * 12) / total) * 100}%` }}
          aria-label={`${board.lengthFt} ft board: ${board.pieces
            .map((p) => `${p.mark} ${feetInches(p.lengthIn)}`)
            .join(', ')}; offcut ${feetInches(board.offcutIn)}`}
        >
          {board.pieces.map((p, i) => (
            <div
              key={i}
              className="flex items-center overflow-hidden border-r border-timber-700 bg-timber-100 px-1 text-xs whitespace-nowrap text-timber-900"
              style={{ width: `${(p.lengthIn / (board.lengthFt * 12)) * 100}%` }}
              title={`${p.mark} ${feetInches(p.lengthIn)}`}
            >
              {p.mark} {feetInches(p.lengthIn)}
            </div>
          ))}
        </div>
        <p className="mt-0.5 text-xs text-sand-600">
          {board.lengthFt} ft stock · offcut {feetInches(board.offcutIn)}
        </p>
      </div>
    </div>
  );
}
