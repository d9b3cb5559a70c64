import { memo, useMemo } from 'react';
import { drawingBounds, fitTransform, jointIndex, overhangTips, toScreen } from './geometry';
import type { DrawingModel } from './model';

const W = 160;
const H = 72;

/** A small line drawing of a truss for pickers: centre lines only, no labels. */
export const TrussThumbnail = memo(function TrussThumbnail({ model }: { model: DrawingModel }) {
  const lines = useMemo(() => {
    const t = fitTransform(drawingBounds(model), W, H, { top: 6, right: 6, bottom: 6, left: 6 });
    const at = jointIndex(model.joints);
    const members = model.members.flatMap((m) => {
      const a = at.get(m.from);
      const b = at.get(m.to);
      return a && b
        ? [{ id: m.id, web: m.role === 'web', a: toScreen(t, a), b: toScreen(t, b) }]
        : [];
    });
    const tips = overhangTips(model).map((o) => ({
      a: toScreen(t, o.heel),
      b: toScreen(t, o.tip),
    }));
    return [...members, ...tips.map((o, i) => ({ id: `oh${i}`, web: false, ...o }))];
  }, [model]);
  return (
    <svg viewBox={`0 0 ${W} ${H}`} aria-hidden="true" className="h-auto w-full">
      {lines.map((l) => (
        <line
          key={l.id}
          x1={l.a.x}
          y1={l.a.y}
          x2={l.b.x}
          y2={l.b.y}
          className={l.web ? 'stroke-timber-400' : 'stroke-timber-700'}
          strokeWidth={l.web ? 1.25 : 2.25}
          strokeLinecap="round"
        />
      ))}
    </svg>
  );
});
