/** Our own mark: a reel seen face-on, for the take-up reel the product is named after. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="#9c4221" />
      <circle cx="16" cy="16" r="9" fill="none" stroke="#f6f1e7" strokeWidth="2.5" />
      <circle cx="16" cy="16" r="2.5" fill="#f6f1e7" />
    </svg>
  );
}
