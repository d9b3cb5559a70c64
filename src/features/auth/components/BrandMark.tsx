/** The Spanwise mark: a small W-web truss in a rounded square, drawn for this product. */
export function BrandMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="7" className="fill-timber-600" />
      <path
        d="M4 23 L16 8 L28 23 Z M10 23 L13 15.5 L16 23 L19 15.5 L22 23"
        fill="none"
        className="stroke-sand-50"
        strokeWidth="2.2"
        strokeLinejoin="round"
      />
    </svg>
  );
}
