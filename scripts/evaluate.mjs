#!/usr/bin/env node
// npm run -s evaluate -- FILE   (FILE a path, or - for stdin): one JSON request in, one JSON response out.
// Runs the esbuild bundle of app/engine + scripts/engine-cli.ts, rebuilt when a source is newer.
import { pathToFileURL } from "node:url";
import { CLI_BUNDLE, ensureBuilt } from "./engine-build.mjs";

await ensureBuilt();
await import(pathToFileURL(CLI_BUNDLE).href);
