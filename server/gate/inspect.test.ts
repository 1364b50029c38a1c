import { describe, expect, it } from "vitest";
import { inspectBody, inspectTarget } from "./inspect.mjs";
import { bodyLimitFor, DEFAULT_BODY_LIMIT, pagePath } from "./limits.mjs";

const body = (text: string) => Buffer.from(text);

describe("body types", () => {
  it("pages take urlencoded, multipart or an empty body without a type", async () => {
    expect(await inspectBody({ pathname: "/sign-in", contentType: "application/x-www-form-urlencoded", body: body("email=x") })).toBeNull();
    expect(await inspectBody({ pathname: "/sign-out", contentType: undefined, body: body("") })).toBeNull();
  });
  it("pages refuse JSON, text and typeless bodies with 415", async () => {
    for (const [contentType, text] of [["application/json", '{"email":"x"}'], ["text/plain", "email=x"], [undefined, "email=x"], ["application/json", ""]] as const) {
      expect(await inspectBody({ pathname: "/sign-in", contentType, body: body(text) })).toMatchObject({ status: 415 });
    }
  });
  it("the API takes JSON, and checks it", async () => {
    expect(await inspectBody({ pathname: "/api/auth/sign-in/email", contentType: "application/json", body: body('{"email":"x"}') })).toBeNull();
    expect(await inspectBody({ pathname: "/api/auth/sign-in/email", contentType: "application/json; charset=utf-8", body: body("{") })).toMatchObject({ status: 400 });
    expect(await inspectBody({ pathname: "/api/v1/x", contentType: "text/plain", body: Buffer.from([0x61, 0]) })).toMatchObject({ status: 400 });
  });
  it("multipart without a boundary is a 400 even when empty", async () => {
    expect(await inspectBody({ pathname: "/members", contentType: "multipart/form-data", body: body("") })).toMatchObject({ status: 400 });
  });
});

describe("request targets", () => {
  it("passes ordinary paths and queries", () => {
    expect(inspectTarget("/invite/7f1c2d?x=%2F&y=caf%C3%A9")).toBeNull();
  });
  it("refuses NUL in the path or the query", () => {
    expect(inspectTarget("/invite/%00abc")).toMatchObject({ status: 400 });
    expect(inspectTarget("/reset-password?token=%00")).toMatchObject({ status: 400 });
  });
  it("refuses a path that does not decode, and absolute-form targets", () => {
    expect(inspectTarget("/invite/%E0%A4%A")).toMatchObject({ status: 400 });
    expect(inspectTarget("http://elsewhere.test/")).toMatchObject({ status: 400 });
  });
});

describe("body limits", () => {
  const table = [{ path: "/sites/:siteId/photos", limit: 10 * 1024 * 1024 }];
  it("gives forms the default and a listed route its own, streamed", () => {
    expect(bodyLimitFor("/members", table)).toEqual({ limit: DEFAULT_BODY_LIMIT, streamed: false });
    expect(bodyLimitFor("/sites/s1/photos", table)).toEqual({ limit: 10 * 1024 * 1024, streamed: true });
    expect(bodyLimitFor("/sites/s1/photos/extra", table).streamed).toBe(false);
  });
  it("counts React Router's data requests as their page", () => {
    expect(pagePath("/members.data")).toBe("/members");
    expect(pagePath("/_root.data")).toBe("/");
    expect(bodyLimitFor("/sites/s1/photos.data", table).streamed).toBe(true);
  });
});
