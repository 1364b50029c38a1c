// oncePerRequest: one read per request's context (or Request, where there is no context object).
import { describe, expect, it, vi } from "vitest";
import { oncePerRequest } from "./request-memo.server";

const request = () => new Request("http://test.invalid/");

describe("oncePerRequest", () => {
  it("reads once for loaders sharing a context, and shares the answer", async () => {
    const read = vi.fn(async () => ({ id: "s1" }));
    const context = {};
    const args = { request: request(), context };
    const [a, b] = await Promise.all([oncePerRequest(args, "site:s1", read), oncePerRequest({ request: request(), context }, "site:s1", read)]);
    expect(read).toHaveBeenCalledTimes(1);
    expect(a).toBe(b);
  });

  it("reads again for another key, another context, or another Request without a context", async () => {
    const read = vi.fn(async () => 1);
    const context = {};
    const r = request();
    await oncePerRequest({ request: r, context }, "site:s1", read);
    await oncePerRequest({ request: r, context }, "site:s2", read);
    await oncePerRequest({ request: r, context: {} }, "site:s1", read);
    expect(read).toHaveBeenCalledTimes(3);
    await oncePerRequest({ request: r }, "site:s1", read);
    await oncePerRequest({ request: r }, "site:s1", read);
    await oncePerRequest({ request: request() }, "site:s1", read);
    expect(read).toHaveBeenCalledTimes(5);
  });
});
