import { isRouteErrorResponse, useRouteError } from "react-router";
import { TextLink } from "./text-link";

export function errorTitle(status: number) {
  return status === 403 ? "Not allowed" : status === 404 ? "Page not found" : "Something went wrong";
}

/** A page's error boundary: the message on a sheet inside the app shell, so navigation stays. */
export function RouteError() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : 500;
  const message = isRouteErrorResponse(error) ? (error.data as { message?: string } | undefined)?.message : undefined;
  return (
    <div role="alert" className="max-w-xl rounded-sheet border border-rule bg-sheet">
      <p className="label-caps border-b border-rule px-6 py-2.5">
        Status <span className="figures">{status}</span>
      </p>
      <div className="p-6">
        <h1 className="text-2xl font-bold text-ink-900">{errorTitle(status)}</h1>
        <p className="mt-2 text-graphite-600">{message ?? "The page could not be shown. Try again in a moment."}</p>
        <p className="mt-5">
          <TextLink to="/">Back to the overview</TextLink>
        </p>
      </div>
    </div>
  );
}
