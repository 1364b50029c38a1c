import { isRouteErrorResponse, Link, useRouteError } from "react-router";

/** A page's error boundary: the message inside the app shell, so navigation stays. */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : 500;
  const message = isRouteErrorResponse(error) ? (error.data as { message?: string } | undefined)?.message : undefined;
  const title = status === 403 ? "Not allowed" : status === 404 ? "Not found" : "Something went wrong";
  return (
    <div role="alert" className="max-w-xl rounded-card border border-ink-200 bg-white p-6">
      <h1 className="text-xl font-semibold text-ink-900">{title}</h1>
      <p className="mt-2 text-sm text-ink-600">{message ?? "The page could not be shown. Try again in a moment."}</p>
      <Link to="/" className="mt-4 inline-block text-sm font-medium text-field-600 underline">
        Back to the overview
      </Link>
    </div>
  );
}
