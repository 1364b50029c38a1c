import { describe, expect, it } from "vitest";
import { z } from "zod";
import { MAX_ECHOED_VALUE, parseForm } from "~/lib/form.server";
import { fieldsOf, topLevelName } from "~/lib/form-fields";

const signIn = z.object({ email: z.string().email(), password: z.string(), redirectTo: z.string().optional() });
const post = (body: string, type = "application/x-www-form-urlencoded") =>
  new Request("http://127.0.0.1/sign-in", { method: "POST", headers: { "content-type": type }, body });

describe("the fields of a schema", () => {
  it("lists an object's keys, plain or nested", () => {
    const schema = z.object({ name: z.string().trim().min(2), tags: z.array(z.string()), site: z.object({ x: z.number() }).optional() });
    expect(Object.fromEntries(fieldsOf(schema))).toEqual({ name: "plain", tags: "nested", site: "nested" });
  });
  it("takes every option of a discriminated union and sees through refinements", () => {
    const union = z.discriminatedUnion("intent", [
      z.object({ intent: z.literal("invite"), email: z.string() }),
      z.object({ intent: z.literal("remove"), memberId: z.string() }).refine(() => true),
    ]);
    expect([...fieldsOf(union).keys()].sort()).toEqual(["email", "intent", "memberId"]);
  });
  it("splits names at the first dot or bracket", () => {
    expect(["contacts[2].email", "a.b", "plain"].map(topLevelName)).toEqual(["contacts", "a", "plain"]);
  });
});

describe("parseForm", () => {
  it("parses the form's own fields", async () => {
    const submission = await parseForm(post("email=a%40b.test&password=secret"), signIn);
    expect(submission.status).toBe("success");
  });
  it("drops unknown fields, so the reply echoes none of them", async () => {
    const submission = await parseForm(post(`email=nope&password=p&${"junk=1&".repeat(150)}evil=%3Cscript%3E`), signIn);
    const reply = submission.reply();
    expect(reply.status).toBe("error");
    expect(Object.keys(reply.initialValue ?? {}).sort()).toEqual(["email", "password"]);
    expect(JSON.stringify(reply)).not.toContain("junk");
  });
  it("takes no list or object paths under a plain field", async () => {
    const reply = (await parseForm(post("email%5B1000%5D=x&email.y=1&password=p"), signIn)).reply();
    expect(JSON.stringify(reply).length).toBeLessThan(400);
    expect(reply.error?.email).toBeTruthy();
  });
  it("cuts a huge echoed value", async () => {
    const reply = (await parseForm(post(`email=${"x".repeat(60_000)}&password=p`), signIn)).reply();
    expect((reply.initialValue?.email as string).length).toBe(MAX_ECHOED_VALUE);
  });
  it("answers a body that is not a form with the schema's messages", async () => {
    const submission = await parseForm(post('{"email":"a@b.test"}', "application/json"), signIn);
    expect(submission.status).toBe("error");
    const bare = await parseForm(new Request("http://127.0.0.1/sign-in", { method: "POST" }), signIn);
    expect(bare.status).toBe("error");
  });
  it("survives a malformed Conform intent", async () => {
    const submission = await parseForm(post("email=a%40b.test&password=p&__intent__=%7Bnot-json"), signIn);
    expect(submission.status).toBe("success");
  });
});
