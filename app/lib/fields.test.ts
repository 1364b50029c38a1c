import { describe, expect, it } from "vitest";
import { emailAddress, newPassword, personName, shortText } from "./fields";

const messages = (schema: { safeParse: (v: unknown) => { success: boolean; error?: { issues: { message: string }[] } } }, value: unknown) =>
  schema.safeParse(value).error?.issues.map((i) => i.message) ?? [];

describe("emailAddress", () => {
  const email = emailAddress();
  it("accepts and lower-cases an ordinary address", () => expect(email.parse("  Nell@Example.TEST ")).toBe("nell@example.test"));
  it("refuses more than 254 characters with a message that says so", () => {
    expect(messages(email, `${"a".repeat(60)}@${"b".repeat(190)}.test`)).toEqual(["Use at most 254 characters."]);
  });
  it("refuses more than 64 characters before the @", () => {
    expect(messages(email, `${"a".repeat(65)}@example.test`)).toEqual(["Use at most 64 characters before the @."]);
    expect(email.parse(`${"a".repeat(64)}@example.test`)).toHaveLength(64 + 13);
  });
  it("asks for an address when empty or missing, and for text when given something else", () => {
    expect(messages(email, "")).toEqual(["Enter your e-mail address."]);
    expect(messages(email, undefined)).toEqual(["Enter your e-mail address."]);
    expect(messages(email, { $ne: null })).toEqual(["Send this as text."]);
  });
  it("names whose address it is when told", () => {
    expect(messages(emailAddress("Enter the e-mail address of the person you are inviting."), "")).toEqual([
      "Enter the e-mail address of the person you are inviting.",
    ]);
  });
  it("refuses a malformed address", () => expect(messages(email, "nell@")).toEqual(["Enter a valid e-mail address."]));
});

describe("personName and shortText", () => {
  it("trims and keeps unicode and markup as text", () => {
    expect(personName.parse("  Zoë <b>Ō'Brien</b> ")).toBe("Zoë <b>Ō'Brien</b>");
  });
  it("refuses more than 100 characters with the limit in the message", () => {
    expect(messages(personName, "x".repeat(101))).toEqual(["Use at most 100 characters."]);
    expect(personName.parse("x".repeat(100))).toHaveLength(100);
  });
  it("refuses control characters such as NUL and line breaks", () => {
    for (const bad of ["Nell\u0000", "Nell\nExample", "Nell\u2028Example", "Ne\u0007ll"]) {
      expect(messages(personName, bad)).toEqual(["Use one line of ordinary characters, without control characters."]);
    }
  });
  it("says 'at least' for a too-short value and the field's own words when empty", () => {
    const org = shortText(120, "Name your consultancy.", 2);
    expect(messages(org, "")).toEqual(["Name your consultancy."]);
    expect(messages(org, "A")).toEqual(["Use at least 2 characters."]);
  });
});

describe("newPassword", () => {
  it("keeps the length limits and the mix rule", () => {
    expect(messages(newPassword, "short-1")).toEqual(["Use at least 10 characters."]);
    expect(messages(newPassword, `a1${"b".repeat(127)}`)).toEqual(["Use at most 128 characters."]);
    expect(messages(newPassword, "abcdefghij")).toEqual(["Mix letters with digits or symbols."]);
    expect(newPassword.parse("perfectly-fine-42")).toBe("perfectly-fine-42");
  });
});
