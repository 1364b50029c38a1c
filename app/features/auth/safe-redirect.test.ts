import { describe, expect, it } from "vitest";
import { safeRedirect } from "./safe-redirect";

describe("safeRedirect", () => {
  // Hostile values as they reach the action (the browser has already decoded the query string once).
  const hostile: [string, unknown][] = [
    ["a tab the browser drops", "/\t/evil.example/"],
    ["a percent-encoded tab", "/%09/evil.example/"],
    ["a newline (a 500 before)", "/\nfoo"],
    ["a carriage return", "/\r\nLocation: https://evil.example"],
    ["a percent-encoded newline", "/%0d%0aSet-Cookie:x=1"],
    ["protocol-relative", "//evil.example"],
    ["backslash after the slash", "/\\evil.example"],
    ["backslash later", "/ok\\..\\..\\evil"],
    ["percent-encoded double slash", "/%2F%2Fevil.example"],
    ["percent-encoded backslash", "/%5Cevil.example"],
    ["encoded slashes without a leading one", "%2F%2Fevil.example"],
    ["an absolute URL", "https://evil.example/"],
    ["a scheme-relative with tab inside", "/\t\\evil.example"],
    ["javascript:", "javascript:alert(1)"],
    ["data:", "data:text/html,<script>alert(1)</script>"],
    ["a relative path", "members"],
    ["a space", "/ /evil.example"],
    ["a no-break space", "/\u00a0/evil.example"],
    ["a line separator", "/\u2028/evil.example"],
    ["a NUL", "/\u0000/evil.example"],
    ["an empty string", ""],
    ["not a string", { toString: () => "/" }],
    ["null", null],
    ["too long", `/${"a".repeat(2001)}`],
    ["broken percent-encoding", "/%E0%A4%A"],
  ];
  for (const [what, value] of hostile) {
    it(`refuses ${what}`, () => expect(safeRedirect(value, "/fallback")).toBe("/fallback"));
  }

  const allowed: [string, string][] = [
    ["/", "/"],
    ["/members", "/members"],
    ["/ok?x=1", "/ok?x=1"],
    ["/invite/0b8f?from=mail#top", "/invite/0b8f?from=mail#top"],
    ["/search?q=a%20b", "/search?q=a%20b"],
    ["/a/../members", "/members"],
  ];
  for (const [value, expected] of allowed) {
    it(`keeps ${value}`, () => expect(safeRedirect(value)).toBe(expected));
  }
});
