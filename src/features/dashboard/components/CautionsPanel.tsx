/** The standing cautions of every design result (DESIGN.md §4.6), compact for landing pages. */
export const CAUTIONS: readonly string[] = [
  'Results are preliminary until the plant’s design reviewer has reviewed the design and, where the jurisdiction requires, a registered design professional has sealed it.',
  'Design loads must be confirmed by the building designer.',
  'Trusses need temporary and permanent bracing as the drawings show and as the industry’s bracing guide describes.',
  'No truss may be cut or altered in the field without a written repair.',
  'Local building codes govern.',
];

/** A calm, readable panel listing {@link CAUTIONS}. */
export function CautionsPanel() {
  return (
    <aside
      aria-labelledby="cautions-title"
      className="rounded-md border border-warning-200 bg-warning-50 px-4 py-3 text-warning-800"
    >
      <h2 id="cautions-title" className="text-sm font-semibold">
        Before anything is built
      </h2>
      <ul className="mt-1.5 list-disc space-y-1 pl-5 text-sm">
        {CAUTIONS.map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
    </aside>
  );
}
