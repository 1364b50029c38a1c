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
