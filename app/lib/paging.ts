// List parameters from a URL: page, page size, search text, sort. Out-of-range values fall back to
// the defaults instead of failing, so a hand-edited address still shows a list.
export type Paging = { page: number; pageSize: number; q: string };

export const PAGE_SIZES = [10, 25, 50, 100] as const;

function intParam(value: string | null, fallback: number, min: number, max: number) {
  if (value === null || !/^\d{1,6}$/.test(value)) return fallback;
  return Math.min(max, Math.max(min, Number(value)));
}

export function readPaging(params: URLSearchParams, defaultSize = 25): Paging {
  return {
    page: intParam(params.get("page"), 1, 1, 100_000),
    pageSize: intParam(params.get("pageSize"), defaultSize, 1, 100),
    q: (params.get("q") ?? "").trim().slice(0, 100),
  };
}

/** A sort key from an allow-list, and a direction. */
export function readSort<K extends string>(params: URLSearchParams, keys: readonly K[], fallback: K): { sort: K; dir: "asc" | "desc" } {
  const raw = params.get("sort");
  const sort = keys.includes(raw as K) ? (raw as K) : fallback;
  return { sort, dir: params.get("dir") === "desc" ? "desc" : "asc" };
}

/** Escapes % and _ so a search text matches literally inside ILIKE. */
export function likePattern(q: string) {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * What a paged list shows under the table: the rows' range, the page count, and whether the page
 * asked for lies past the last one (a hand-edited or stale address after rows were removed).
 */
export function pageWindow(total: number, page: number, pageSize: number) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const pastEnd = total > 0 && page > pages;
  if (total === 0 || pastEnd) return { pages, pastEnd, from: 0, to: 0, text: total === 0 ? "Nothing to show" : `${total} in all` };
  const from = (page - 1) * pageSize + 1;
  const to = Math.min(total, page * pageSize);
  return { pages, pastEnd, from, to, text: `${from}–${to} of ${total}` };
}

/** The page sizes a list offers, with the one in the address when it is not a usual one. */
export function pageSizeOptions(pageSize: number): number[] {
  return [...new Set<number>([...PAGE_SIZES, pageSize])].sort((a, b) => a - b);
}
