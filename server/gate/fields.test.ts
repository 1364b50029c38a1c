import { describe, expect, it } from "vitest";
import { checkFieldName, inspectJson, inspectMultipart, inspectUrlencoded, MAX_FIELDS } from "./fields.mjs";

const form = (text: string) => Buffer.from(text);
const multipart = (parts: string[], boundary = "XyZ") =>
  Buffer.from(parts.map((p) => `--${boundary}\r\n${p}\r\n`).join("") + `--${boundary}--\r\n`);
const field = (name: string, value: string) => `Content-Disposition: form-data; name="${name}"\r\n\r\n${value}`;

describe("field names", () => {
  it("accepts plain names, nested paths and indexes up to 1000", () => {
    for (const name of ["email", "contacts[0].email", "a.b.c", "rows[1000]", "x[]"]) expect(checkFieldName(name)).toBeNull();
  });
  it("refuses indexes above 1000, long names and NUL", () => {
    expect(checkFieldName("email[100000000]")).toMatchObject({ status: 400 });
    expect(checkFieldName("rows[0][1001]")).toMatchObject({ status: 400 });
    expect(checkFieldName("n".repeat(201))).toMatchObject({ status: 400 });
    expect(checkFieldName("a\0b")).toMatchObject({ status: 400 });
  });
});

describe("urlencoded bodies", () => {
  it("passes an ordinary form", () => {
    expect(inspectUrlencoded(form("email=a%40b.test&password=x+y&redirectTo=%2Fmembers"))).toBeNull();
  });
  it("allows 200 fields and refuses 201 with 413", () => {
    expect(inspectUrlencoded(form(Array(MAX_FIELDS).fill("a=1").join("&")))).toBeNull();
    expect(inspectUrlencoded(form(Array(MAX_FIELDS + 1).fill("a=1").join("&")))).toMatchObject({ status: 413 });
  });
  it("counts a flood of repeated keys in one pass", () => {
    expect(inspectUrlencoded(form("a=1&".repeat(16_000)))).toMatchObject({ status: 413 });
  });
  it("refuses the huge index of the 38-byte out-of-memory post", () => {
    expect(inspectUrlencoded(form("email%5B100000000%5D=x&password=p"))).toMatchObject({ status: 400, message: expect.stringContaining("index") });
  });
  it("refuses NUL raw or percent-encoded, in names or values", () => {
    expect(inspectUrlencoded(form("a=%00"))).toMatchObject({ status: 400 });
    expect(inspectUrlencoded(form("a%00b=1"))).toMatchObject({ status: 400 });
    expect(inspectUrlencoded(Buffer.from([0x61, 0x3d, 0x00]))).toMatchObject({ status: 400 });
  });
  it("ignores empty pairs when counting", () => {
    expect(inspectUrlencoded(form("&".repeat(5000) + "a=1"))).toBeNull();
  });
});

describe("multipart bodies", () => {
  const type = "multipart/form-data; boundary=XyZ";
  it("passes fields and a binary file", async () => {
    const file = `Content-Disposition: form-data; name="photo"; filename="p.bin"\r\nContent-Type: application/octet-stream\r\n\r\n\0\x01\x02`;
    expect(await inspectMultipart(multipart([field("name", "Roof A"), file]), type)).toBeNull();
  });
  it("refuses a missing boundary", async () => {
    expect(await inspectMultipart(multipart([field("a", "1")]), "multipart/form-data")).toMatchObject({ status: 400 });
  });
  it("refuses more than 200 parts", async () => {
    const parts = Array.from({ length: MAX_FIELDS + 1 }, (_, i) => field(`f${i}`, "1"));
    expect(await inspectMultipart(multipart(parts), type)).toMatchObject({ status: 413 });
  });
  it("refuses a huge index and NUL in a text field", async () => {
    expect(await inspectMultipart(multipart([field("email[5000]", "x")]), type)).toMatchObject({ status: 400 });
    expect(await inspectMultipart(multipart([field("name", "a\0b")]), type)).toMatchObject({ status: 400 });
  });
  it("takes a part with an empty name", async () => {
    expect(await inspectMultipart(multipart([field("", "x")]), type)).toBeNull();
  });
  it("refuses a body cut before its closing boundary", async () => {
    expect(await inspectMultipart(Buffer.from(`--XyZ\r\n${field("a", "1")}`), type)).toMatchObject({ status: 400 });
  });
});

describe("JSON bodies", () => {
  it("passes well-formed JSON and an empty body", () => {
    expect(inspectJson(Buffer.from('{"email":"a@b.test","tags":["x",{"y":1}]}'))).toBeNull();
    expect(inspectJson(Buffer.alloc(0))).toBeNull();
  });
  it("refuses malformed JSON", () => {
    expect(inspectJson(Buffer.from('{"email":'))).toMatchObject({ status: 400 });
  });
  it("refuses \\u0000 in a value or a key, however deep", () => {
    expect(inspectJson(Buffer.from('{"a":"x\\u0000"}'))).toMatchObject({ status: 400 });
    expect(inspectJson(Buffer.from('[[{"k\\u0000":1}]]'))).toMatchObject({ status: 400 });
  });
  it("walks deep nesting without recursion", () => {
    const deep = "[".repeat(20_000) + '"\\u0000"' + "]".repeat(20_000);
    expect(inspectJson(Buffer.from(deep))).toMatchObject({ status: 400 });
  });
});
