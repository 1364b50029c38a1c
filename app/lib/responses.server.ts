// The thrown answers of page loaders and actions, shown by the route's error boundary.
import { data } from "react-router";

export const notFound = (message = "There is nothing at this address.") => data({ message }, { status: 404 });
export const forbidden = (message = "Your role does not give access to this page.") => data({ message }, { status: 403 });

/** The value, or a thrown 404 when the lookup found nothing (another organisation's id included). */
export function found<T>(value: T | null | undefined, message = "There is nothing at this address."): T {
  if (value === null || value === undefined) throw notFound(message);
  return value;
}
