import { BASE_ERROR_CODES } from "better-auth";
import { describe, expect, it } from "vitest";
import { authMessage, OWN_CODES, SOMETHING_WRONG, TOO_MANY_REQUESTS } from "./auth-messages";

describe("authMessage", () => {
  it("never repeats better-auth's own message, for any of its codes", () => {
    for (const [code, { message }] of Object.entries(BASE_ERROR_CODES)) {
      const ours = authMessage({ status: 400, code, message });
      expect(ours, code).not.toBe(message);
      expect(ours, code).toMatch(/^[A-Z].*\.$/);
    }
  });
  it("answers 'Failed to create user' (a NUL in the name) in our words", () => {
    expect(authMessage({ status: 422, code: "FAILED_TO_CREATE_USER", message: "Failed to create user" })).toMatch(/could not be created/);
  });
  it("passes on the messages of our own hook, which are already ours", () => {
    expect(authMessage({ status: 429, code: OWN_CODES.throttled, message: "Too many failed attempts. Wait 2 seconds, then try again." })).toBe(
      "Too many failed attempts. Wait 2 seconds, then try again.",
    );
  });
  it("uses our words for better-auth's own rate limit and for unknown codes", () => {
    expect(authMessage({ status: 429, message: "Too many requests. Please try again later." })).toBe(TOO_MANY_REQUESTS);
    expect(authMessage({ status: 500, code: "SOMETHING_NEW", message: "raw" })).toBe(SOMETHING_WRONG);
    expect(authMessage({ status: 400, code: "SOMETHING_NEW" }, "Fallback.")).toBe("Fallback.");
  });
});
