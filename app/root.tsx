// First: Zod must not probe for eval before any form schema is built (see the module).
import "~/lib/zod-config";
import { useEffect } from "react";
import { isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import type { Route } from "./+types/root";
import { sessionMiddleware } from "~/features/auth/session-context.server";
import { Wordmark } from "./components/mark";
import { errorTitle } from "./components/route-error";
import "./app.css";

/** One session lookup per request, shared by the layout and the page (guard.server.ts). */
export const middleware: Route.MiddlewareFunction[] = [sessionMiddleware];

export const links: Route.LinksFunction = () => [{ rel: "icon", href: "/favicon.svg", type: "image/svg+xml" }];

export function Layout({ children }: { children: React.ReactNode }) {
  // Marks the page interactive; browser tests wait for it before using controls.
  useEffect(() => {
    document.documentElement.dataset.hydrated = "true";
  }, []);
  return (
    <html lang="en-GB">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <Meta />
        <Links />
      </head>
      <body className="min-h-screen font-sans">
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  let status = 500;
  let detail = "The page could not be shown. Try again, or go back to the overview.";
  if (isRouteErrorResponse(error)) {
    status = error.status;
    const message = (error.data as { message?: string } | undefined)?.message;
    detail = message ?? (error.status === 404 ? "There is no page at this address." : error.statusText || detail);
  }
  const title = errorTitle(status);
  return (
    <main className="graph-paper flex min-h-screen flex-col items-center px-4 py-16">
      <title>{`${title} · Isotrope`}</title>
      <a href="/" className="mb-6 px-1 py-1">
        <Wordmark size="lg" />
      </a>
      <div className="w-full max-w-md rounded-sheet border border-ink-900 bg-sheet shadow-[5px_5px_0_var(--color-rule)]">
        <p className="label-caps border-b border-rule px-6 py-2.5">
          Status <span className="figures">{status}</span>
        </p>
        <div className="p-6">
          <h1 className="text-2xl font-bold">{title}</h1>
          <p className="mt-2 text-graphite-600">{detail}</p>
          <p className="mt-5">
            <a className="link" href="/">
              Back to the overview
            </a>
          </p>
        </div>
      </div>
    </main>
  );
}
