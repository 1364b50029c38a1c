import type { ReactNode } from "react";
import { Link } from "react-router";
import type { Flash } from "~/infra/flash.server";

export function Card({ title, children, actions }: { title?: ReactNode; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-card border border-ink-200 bg-white p-5 shadow-xs">
      {title || actions ? (
        <div className="mb-4 flex items-center justify-between gap-3">
          {title ? <h2 className="text-base font-semibold text-ink-900">{title}</h2> : <span />}
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-card border border-dashed border-ink-200 px-6 py-10 text-center">
      <p className="font-medium text-ink-800">{title}</p>
      {children ? <div className="mt-1 text-sm text-ink-600">{children}</div> : null}
    </div>
  );
}

const flashTone: Record<Flash["kind"], string> = {
  success: "border-ok-700/30 bg-ok-100 text-ok-700",
  error: "border-danger-600/30 bg-danger-100 text-danger-600",
  info: "border-ink-200 bg-white text-ink-800",
};

/** The message a redirect left behind, announced to screen readers. */
export function FlashMessage({ flash }: { flash: Flash | null }) {
  if (!flash) return null;
  return (
    <div role="status" className={`mb-4 rounded-md border px-4 py-2.5 text-sm ${flashTone[flash.kind]}`}>
      {flash.message}
    </div>
  );
}

export function PageHeader({ title, children, actions }: { title: string; children?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-3">
      <div className="min-w-0">
        <h1 className="text-2xl font-semibold tracking-tight break-words text-ink-900">{title}</h1>
        {children ? <div className="mt-1 text-sm text-ink-600">{children}</div> : null}
      </div>
      {actions ? <div className="flex gap-2">{actions}</div> : null}
    </header>
  );
}

/** The one link under an auth card: back to sign-in, or wherever the page points. */
export function FooterLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <p className="mt-6 text-sm">
      <Link to={to} className="text-field-600 underline">
        {children}
      </Link>
    </p>
  );
}
