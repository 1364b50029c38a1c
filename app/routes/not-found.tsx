import { data } from "react-router";
import type { Route } from "./+types/not-found";

export const meta: Route.MetaFunction = () => [{ title: "Page not found · Isotrope" }];

// Public: anyone may reach an unknown address. The app layout around it shows navigation when signed in.
export function loader() {
  throw data({ message: "There is no page at this address. It may have moved, or the link may be incomplete." }, { status: 404 });
}

export default function NotFound() {
  return null;
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
