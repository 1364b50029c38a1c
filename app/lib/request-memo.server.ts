// A value read at most once per request and shared by the loaders of that request (a site page's
// parent and section loaders both need the site). Kept on React Router's request context object
// (one per request with `v8_middleware`), else on the Request (loaders called directly, as the
// integration tests do with a fresh `context: {}` each). Use it in loaders only: an action that
// changes what was read must read it fresh, and so it does, since it asks before any loader and
// does not go through here.
type RequestArgs = { request: Request; context?: unknown };

const memos = new WeakMap<object, Map<string, Promise<unknown>>>();

export function oncePerRequest<T>(args: RequestArgs, key: string, read: () => Promise<T>): Promise<T> {
  const owner = typeof args.context === "object" && args.context !== null ? args.context : args.request;
  let memo = memos.get(owner);
  if (!memo) memos.set(owner, (memo = new Map()));
  let value = memo.get(key) as Promise<T> | undefined;
  if (!value) memo.set(key, (value = read()));
  return value;
}
