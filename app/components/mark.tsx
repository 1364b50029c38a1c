/**
 * Isotrope's mark: a directional antenna's polar pattern (main lobe and back lobe) drawn on a
 * plan's crosshair, on an ink tile. The same drawing as public/favicon.svg.
 */
export function Mark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="3" className="fill-ink-900" />
      <path d="M16 3v26M3 16h26" className="stroke-paper" strokeOpacity=".45" />
      <path d="M16 3v2.5M16 26.5V29M3 16h2.5M26.5 16H29" className="stroke-paper" strokeWidth="1.5" />
      <g transform="translate(16 16) rotate(-40)" className="stroke-flag-400" strokeLinejoin="round">
        <path d="M0 0C2.6-5 9.6-5.6 13.2 0C9.6 5.6 2.6 5 0 0Z" className="fill-flag-400" fillOpacity=".28" strokeWidth="1.8" />
        <path d="M0 0C-.9-1.9-2.8-1.9-3.6 0C-2.8 1.9-.9 1.9 0 0Z" fill="none" strokeWidth="1.4" />
      </g>
      <circle cx="16" cy="16" r="1.8" className="fill-paper" />
    </svg>
  );
}

/** The mark with the name beside it, as the header and the signed-out pages show it. */
export function Wordmark({ size = "md" }: { size?: "md" | "lg" }) {
  return (
    <span className="flex items-center gap-2.5">
      <Mark className={size === "lg" ? "h-9 w-9" : "h-8 w-8"} />
      <span className={`font-bold tracking-tight text-ink-900 ${size === "lg" ? "text-xl" : "text-lg"}`}>Isotrope</span>
    </span>
  );
}
