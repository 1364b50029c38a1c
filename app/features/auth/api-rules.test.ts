import { describe, expect, it } from "vitest";
import { apiBodyRules, describeIssues, isOpenAuthEndpoint } from "./api-rules";

describe("isOpenAuthEndpoint", () => {
  it("opens what the pages and mailed links use", () => {
    for (const [method, path] of [
      ["POST", "/sign-in/email"], ["POST", "/sign-up/email"], ["POST", "/sign-out"], ["GET", "/get-session"],
      ["GET", "/verify-email"], ["POST", "/send-verification-email"], ["POST", "/request-password-reset"],
      ["GET", "/reset-password/abc123"], ["POST", "/reset-password"], ["POST", "/change-password"],
    ]) expect(isOpenAuthEndpoint(method, path), `${method} ${path}`).toBe(true);
  });
  it("closes everything else, and the open paths under other methods", () => {
    for (const [method, path] of [
      ["POST", "/update-user"], ["POST", "/delete-user"], ["POST", "/change-email"], ["GET", "/list-sessions"],
      ["POST", "/revoke-sessions"], ["GET", "/list-accounts"], ["POST", "/organization/create"], ["GET", "/organization/list-members"],
      ["GET", "/sign-in/email"], ["POST", "/get-session"], ["POST", "/reset-password/abc/def"], ["POST", "/sign-in/social"],
      ["POST", "/sign-in/email/"], ["GET", "/ok"], ["GET", "/error"],
    ]) expect(isOpenAuthEndpoint(method, path), `${method} ${path}`).toBe(false);
  });
});

describe("apiBodyRules", () => {
  const signUp = apiBodyRules["/sign-up/email"];
  const refusal = (body: unknown) => {
    const parsed = signUp.safeParse(body);
    return parsed.success ? null : describeIssues(parsed.error);
  };
  const ok = { name: "Nell Example", email: "nell@example.test", password: "perfectly-fine-42" };

  it("takes what the sign-up form takes", () => expect(refusal({ ...ok, callbackURL: "/verified" })).toBeNull());
  it("refuses a long name, naming the field and the limit", () => expect(refusal({ ...ok, name: "x".repeat(5_000_000) })).toBe("name: Use at most 100 characters."));
  it("refuses objects where text belongs", () => expect(refusal({ ...ok, name: { $ne: null } })).toBe("name: Send this as text."));
  it("refuses long addresses", () => expect(refusal({ ...ok, email: `${"a".repeat(65)}@example.test` })).toBe("email: Use at most 64 characters before the @."));
  it("refuses weak passwords as the form does", () => expect(refusal({ ...ok, password: "abcdefghij" })).toBe("password: Mix letters with digits or symbols."));
  it("refuses fields the form doesn't have", () => expect(refusal({ ...ok, image: "https://evil.example/x.png", role: "owner" })).toBe("Unknown fields: image, role."));
  it("refuses a callback to another site", () => expect(refusal({ ...ok, callbackURL: "https://evil.example" })).toMatch(/^callbackURL: /));
  it("refuses a body that is not an object", () => expect(refusal("name=x")).toBe("Send a JSON object with the fields of this form."));
});
