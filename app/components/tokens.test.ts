// Every colour a class names is a token of app.css: Tailwind's own palette is cleared there, so a
// class such as `text-gray-600` or a renamed token would silently render unstyled.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const appDir = new URL("..", import.meta.url).pathname;
const css = readFileSync(join(appDir, "app.css"), "utf8");
const tokens = new Set([...css.matchAll(/--color-([a-z]+(?:-\d+)?):/g)].map((m) => m[1]));

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return name === "engine" || name.startsWith(".") || name === "+types" ? [] : sources(path);
    return /\.(tsx|ts)$/.test(name) && !name.endsWith(".test.ts") ? [path] : [];
  });
}

const prefixes = "bg|text|border(?:-[trblxy])?|ring|outline|divide|fill|stroke|decoration|placeholder|from|via|to|caret|accent";
// A colour class with a shade: `text-ink-900`, `hover:bg-flag-100`, `ring-danger-700/60`.
const shaded = new RegExp(`(?<![\\w-])(?:[a-z-]+:)*(?:${prefixes})-([a-z]+-\\d{2,3})(?:\\/\\d+)?(?![\\w-])`, "g");

describe("design tokens", () => {
  it("defines the palette the components use", () => {
    for (const name of ["paper", "sheet", "rule", "ink-900", "graphite-600", "flag-600", "danger-700", "caution-700", "ok-700"]) {
      expect(tokens, name).toContain(name);
    }
  });

  it("every shaded colour class in app/ names a defined token", () => {
    const unknown: string[] = [];
    for (const file of sources(appDir)) {
      for (const match of readFileSync(file, "utf8").matchAll(shaded)) {
        if (!tokens.has(match[1])) unknown.push(`${file.slice(appDir.length)}: ${match[0]}`);
      }
    }
    expect(unknown).toEqual([]);
  });
});
