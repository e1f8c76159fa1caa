/** The product's name, the same in every language. */
const NAME = 'Mendery';

export function Logo({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <svg viewBox="0 0 32 32" className="size-8" aria-hidden>
        <circle cx="16" cy="16" r="15" fill="#23395d" />
        <path
          d="M9 20c3-6 11-6 14 0"
          stroke="#e7a36f"
          strokeWidth="3"
          fill="none"
          strokeLinecap="round"
          strokeDasharray="3 2.2"
        />
        <circle cx="16" cy="12" r="2.6" fill="#f6f1ea" />
      </svg>
      <span className="text-xl font-extrabold tracking-tight text-navy">{NAME}</span>
    </span>
  );
}
