import type { ReactNode } from "react";
import type { Flash } from "~/infra/flash.server";
import { StateGlyph, type State } from "./state-glyph";
import { TextLink } from "./text-link";

/** A sheet: white, ruled, with a title strip like a title-block cell. */
export function Card({ title, children, actions }: { title?: ReactNode; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="min-w-0 rounded-sheet border border-rule bg-sheet">
      {title || actions ? (
        <div className="flex flex-wrap items-center justify-between gap-x-3 gap-y-2 border-b border-rule px-5 py-3">
          {title ? <h2 className="text-lg font-bold text-ink-900">{title}</h2> : <span />}
          {actions}
        </div>
      ) : null}
      <div className="p-5">{children}</div>
    </section>
  );
}

/** Nothing to show yet: dashed, like a construction line. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-sheet border border-dashed border-rule-strong px-5 py-6 text-center">
      <p className="font-medium text-ink-900">{title}</p>
      {children ? <div className="mt-1 text-sm text-graphite-600">{children}</div> : null}
    </div>
  );
}

const tones: Record<State, string> = {
  ok: "border-ok-700 bg-ok-100 text-ok-700",
  danger: "border-danger-700 bg-danger-100 text-danger-700",
  caution: "border-caution-700 bg-caution-100 text-caution-700",
  info: "border-ink-900 bg-paper text-ink-900",
};

const flashState: Record<Flash["kind"], State> = { success: "ok", error: "danger", info: "info" };

/** A one-line state message: glyph, a left rule and a tint, so it reads in greyscale too. */
export function Notice({ state, children, role }: { state: State; children: ReactNode; role?: "status" | "alert" }) {
  return (
    <div role={role} className={`flex items-start gap-2 rounded-control border-l-4 px-4 py-2.5 text-sm ${tones[state]}`}>
      <StateGlyph state={state} className="mt-0.5 h-4 w-4" />
      <div className="min-w-0 [overflow-wrap:anywhere]">{children}</div>
    </div>
  );
}

/** The message a redirect left behind, announced to screen readers. */
export function FlashMessage({ flash }: { flash: Flash | null }) {
  if (!flash) return null;
  return (
    <div className="mb-5">
      <Notice state={flashState[flash.kind]} role="status">
        {flash.message}
      </Notice>
    </div>
  );
}

/** A page's title: an optional title-block label above, a short description below, actions at the right, an ink rule under. */
export function PageHeader({ title, label, children, actions }: { title: string; label?: ReactNode; children?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-3 border-b border-ink-900 pb-4">
      <div className="min-w-0">
        {label ? <p className="label-caps mb-1 [overflow-wrap:anywhere]">{label}</p> : null}
        <h1 className="text-2xl font-bold tracking-tight [overflow-wrap:anywhere] text-ink-900 sm:text-3xl">{title}</h1>
        {children ? <div className="mt-1 text-base text-graphite-600">{children}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}

/** The one link under an auth card: back to sign-in, or wherever the page points. */
export function FooterLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <p className="mt-6 border-t border-rule pt-4 text-sm">
      <TextLink to={to}>{children}</TextLink>
    </p>
  );
}
