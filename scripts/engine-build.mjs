/**
 * Bundle the TypeScript engine and its command line with esbuild into
 * node_modules/.cache/isotrope-engine/ (git-ignored) when the bundle is missing
 * or older than any source — a cheap mtime check, so `npm run evaluate` never
 * pays for tsx. Not build/: `react-router build` empties build/ and would pull
 * the bundle from under a running command line.
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, statSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");
export const OUT_DIR = join(ROOT, "node_modules", ".cache", "isotrope-engine");
export const CLI_BUNDLE = join(OUT_DIR, "engine-cli.mjs");
export const LIB_BUNDLE = join(OUT_DIR, "engine-lib.mjs");
const ENTRIES = {
  "engine-worker": join(ROOT, "scripts", "engine-worker.ts"),
  "engine-lib": join(ROOT, "app", "engine", "index.ts"),
  "engine-cli": join(ROOT, "scripts", "engine-cli.ts"), // last: its mtime marks a complete build
};

function newestSourceMs() {
  let newest = 0;
  const consider = (p) => {
    const m = statSync(p).mtimeMs;
    if (m > newest) newest = m;
  };
  const engineDir = join(ROOT, "app", "engine");
  for (const f of readdirSync(engineDir)) if (f.endsWith(".ts") && !f.endsWith(".test.ts")) consider(join(engineDir, f));
  for (const f of readdirSync(join(ROOT, "scripts"))) if (/^engine-.*\.(ts|mjs)$/.test(f)) consider(join(ROOT, "scripts", f));
  if (existsSync(join(ROOT, "package-lock.json"))) consider(join(ROOT, "package-lock.json"));
  return newest;
}

export function isStale() {
  return !existsSync(CLI_BUNDLE) || statSync(CLI_BUNDLE).mtimeMs < newestSourceMs();
}

/** Build when stale; returns true when it built. Safe against concurrent callers (temp dir + rename). */
export async function ensureBuilt() {
  if (!isStale()) return false;
  const { build } = await import("esbuild");
  const tmp = join(OUT_DIR, "..", `isotrope-engine-tmp-${process.pid}-${Date.now()}`);
  mkdirSync(tmp, { recursive: true });
  try {
    await build({
      entryPoints: ENTRIES,
      outdir: tmp,
      bundle: true,
      platform: "node",
      format: "esm",
      target: "node20",
      outExtension: { ".js": ".mjs" },
      minifyWhitespace: true,
      minifySyntax: true,
      legalComments: "none",
      logLevel: "error",
    });
    mkdirSync(OUT_DIR, { recursive: true });
    for (const name of Object.keys(ENTRIES)) renameSync(join(tmp, `${name}.mjs`), join(OUT_DIR, `${name}.mjs`));
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
  return true;
}
