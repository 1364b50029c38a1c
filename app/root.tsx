// First: Zod must not probe for eval before any form schema is built (see the module).
import "~/lib/zod-config";
import { useEffect } from "react";
import { isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration } from "react-router";
import type { Route } from "./+types/root";
import { sessionMiddleware } from "~/features/auth/session-context.server";
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
  let title = "Something went wrong";
  let detail = "The page could not be shown. Try again, or go back to the overview.";
  if (isRouteErrorResponse(error)) {
    title = error.status === 404 ? "Page not found" : error.status === 403 ? "Not allowed" : `Error ${error.status}`;
    const message = (error.data as { message?: string } | undefined)?.message;
    detail = message ?? (error.status === 404 ? "There is no page at this address." : error.statusText || detail);
  }
  return (
    <main className="mx-auto max-w-xl px-6 py-24">
      <p className="text-sm font-medium text-field-600">Isotrope</p>
      <h1 className="mt-2 text-2xl font-semibold">{title}</h1>
      <p className="mt-3 text-ink-600">{detail}</p>
      <a className="mt-6 inline-block text-sm font-medium text-field-600 underline" href="/">
        Back to the overview
      </a>
    </main>
  );
}
