/** The product's mark: a slope profile with a dashed slip arc. */
export function Wordmark({ inverted = false }: { inverted?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2">
      <svg width="26" height="26" viewBox="0 0 32 32" aria-hidden="true">
        <rect width="32" height="32" rx="6" fill={inverted ? "#f6f4ef" : "#1f1d1a"} />
        <path d="M4 24 L12 24 L22 12 L28 12 L28 28 L4 28 Z" fill="#b5562b" />
        <path
          d="M9 26 A14 14 0 0 0 25 11"
          fill="none"
          stroke={inverted ? "#1f1d1a" : "#f6f4ef"}
          strokeWidth="2"
          strokeDasharray="3 2"
        />
      </svg>
      <span className={`text-lg font-semibold tracking-tight ${inverted ? "text-paper" : "text-ink"}`}>Scarpline</span>
    </span>
  );
}
