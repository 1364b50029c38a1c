// Where to go after sign-in: only a plain path on this site, never another host.
const BASE = "http://isotrope.invalid";
// Any whitespace or control character (browsers drop tabs and newlines inside URLs, so
// "/\t/evil.example" becomes "//evil.example"), and the backslash browsers read as "/".
const UNSAFE_RAW = /[\s\u0000-\u001f\u007f-\u009f\\]/;
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;

function decoded(to: string): string | null {
  try {
    return decodeURIComponent(to);
  } catch {
    return null;
  }
}

/** `to` when it is a same-site path ("/members?x=1"), else `fallback`. */
export function safeRedirect(to: unknown, fallback = "/"): string {
  if (typeof to !== "string" || to.length === 0 || to.length > 2000) return fallback;
  if (!to.startsWith("/") || to.startsWith("//") || UNSAFE_RAW.test(to)) return fallback;
  // The same checks once more on the percent-decoded form, for anything that decodes it again.
  const plain = decoded(to);
  if (plain === null || plain.startsWith("//") || plain.startsWith("/\\") || CONTROL.test(plain)) return fallback;
  let url: URL;
  try {
    url = new URL(to, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE) return fallback;
  return url.pathname + url.search + url.hash;
}
