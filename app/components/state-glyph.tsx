// Small glyphs that tell states apart without colour: a bar-crossed square for danger, a triangle
// for caution, a tick for done, a ruled i for information. Drawn in currentColor, hidden from
// screen readers (the words beside them say the same).
export type State = "danger" | "caution" | "ok" | "info";

const paths: Record<State, string> = {
  danger: "M2.5 2.5h11v11h-11z M5.5 5.5l5 5M10.5 5.5l-5 5",
  caution: "M8 2.2L14.2 13.5H1.8Z M8 6.5v3.2M8 11.2v.3",
  ok: "M2.8 8.6l3.3 3.2 7.1-7.4",
  info: "M8 1.8a6.2 6.2 0 1 0 0 12.4a6.2 6.2 0 1 0 0-12.4Z M8 7v4.6M8 4.6v.3",
};

export function StateGlyph({ state, className = "h-4 w-4" }: { state: State; className?: string }) {
  return (
    <svg viewBox="0 0 16 16" className={`shrink-0 ${className}`} aria-hidden="true" focusable="false">
      <path d={paths[state]} fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}
