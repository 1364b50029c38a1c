/** The engine must stay importable by the browser, loaders and the CLI alike: no Node-only or framework imports. */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const ALLOWED = new Set(["zod/mini", "zod/v4/locales/en.js", "d3-contour"]);

describe("app/engine purity", () => {
  const files = readdirSync(__dirname).filter((f) => f.endsWith(".ts") && !f.endsWith(".test.ts"));
  it.each(files)("%s imports only relative modules, zod/mini (with its English messages) and d3-contour", (f) => {
    const src = readFileSync(join(__dirname, f), "utf8");
    const specs = [...src.matchAll(/\bfrom\s+"([^"]+)"|\bimport\(\s*"([^"]+)"\s*\)|\brequire\(\s*"([^"]+)"\s*\)/g)].map((m) => m[1] ?? m[2] ?? m[3]);
    for (const s of specs) expect(s.startsWith("./") || ALLOWED.has(s), `${f} imports ${s}`).toBe(true);
    expect(src).not.toMatch(/\bprocess\.|\bBuffer\b|\b__dirname\b/);
  });
});
