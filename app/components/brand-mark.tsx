/** Takeline's mark: a tangent bending into a curve, crossed by a right-of-way tick. */
export function BrandMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="var(--color-action)" />
      <path d="M5 24 L13 24 A11 11 0 0 0 23.5 16.5 L27 7" fill="none" stroke="#fff" strokeWidth="2.6" strokeLinecap="round" />
      <path d="M17.5 18.5 l4 4" stroke="var(--color-take)" strokeWidth="2.6" strokeLinecap="round" />
    </svg>
  );
}
