import type { DesignInput } from '../../../../shared/api/design';
import { designInputFacts, lumberFacts } from '../../../components/truss/design-facts';

/**
 * The editor's fields as a compact fact list for paper (the form itself is not printed): what a
 * printed truss states beside its drawing. Hidden on screen.
 */
export function PrintedFacts({
  input,
  presented,
  mark,
  quantity,
  plies,
}: {
  input: DesignInput | null;
  presented: unknown;
  mark: string;
  quantity: string;
  plies: string;
}) {
  if (!input) return null;
  const facts = [
    ...designInputFacts(input, { quantity: Number(quantity) || 0, plies: Number(plies) || 1 }),
    ...lumberFacts(presented, input),
  ];
  return (
    <section
      aria-label="Design input"
      className="hidden break-inside-avoid rounded-lg border border-sand-200 p-3 print:block"
    >
      <h2 className="mb-2 text-sm font-semibold text-sand-900">
        {mark.trim() ? `Truss ${mark.trim()}` : 'Truss'} — design input
      </h2>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-0.5 text-xs">
        {facts.map((f) => (
          <div key={f.label} className="contents">
            <dt className="font-semibold text-sand-600">{f.label}</dt>
            <dd className="text-sand-900">{f.value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
