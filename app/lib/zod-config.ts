// Zod compiles object parsers with `new Function` where it may, and probes for that ability with a
// caught `new Function("")`. The pages' Content-Security-Policy forbids eval, and browsers report
// the probe as a violation; so Zod parses without compiling. Imported first by root.tsx: React
// Router's hydration script imports the root route module before any other route module.
import { z } from "zod";

z.config({ jitless: true });
