// Emitter CSV import speed: generates an N-row file (default 5 000) in the layout of README.md
// ("Emitter CSV"), imports it into a bench site three times through the feature function (check +
// one transaction with bulk inserts and audit rows), and once over HTTP when the app answers at
// APP_URL; prints the times and the rows stored. Figures only, no verdict. Run it on the test stack:
//   npm run -s with-stack -- node scripts/bench-emitter-import.mjs 5000
//   BUILD_DIR=build-test npm run -s build && WITH_APP=1 npm run -s with-stack -- node scripts/bench-emitter-import.mjs 5000
import { createHmac, randomBytes, randomUUID } from "node:crypto";
import { cpus, loadavg } from "node:os";
import { register } from "tsx/esm/api";
import postgres from "postgres";

const rows = Number(process.argv[2] ?? 5000);
process.env.EMITTER_IMPORT_TIMING ??= "1";
if (!process.env.DATABASE_URL) throw new Error("Run through `npm run with-stack` (DATABASE_URL is needed).");
const sql = postgres(process.env.DATABASE_URL, { max: 2, onnotice: () => {} });
register({ tsconfig: "./tsconfig.json" });
const { importEmitters } = await import("../app/features/emitters/bulk.server.ts");
const { emittersFromCsvBytes } = await import("../app/features/emitters/csv.ts");
const { db } = await import("../app/infra/db.server.ts");

function csv(n) {
  const operators = ["Northwind Mobile", "Saltmarsh Telecom", "Brightwave Wireless"];
  const lines = ["label,operator,band,frequency_mhz,power_per_carrier_w,power_per_carrier_dbm,carriers,loss_db,gain_dbi,gain_dbd,pattern_model,h_beamwidth_deg,v_beamwidth_deg,azimuth_deg,mechanical_tilt_deg,electrical_tilt_deg,x_m,y_m,z_m,model,aperture_m,duty_factor,actual_max_factor,tdd_factor,active,notes"];
  for (let i = 0; i < n; i++) {
    const dbm = i % 3 === 0;
    const dbd = i % 4 === 0;
    const f = [739, 881, 1960, 2130, 2655, 3650][i % 6];
    lines.push([`E${i + 1}`, operators[i % 3], `Band ${f}`, f, dbm ? "" : 20 + (i % 40), dbm ? 43 + (i % 5) : "", 1 + (i % 4), (i % 20) / 10, dbd ? "" : 15 + (i % 30) / 10, dbd ? 13 + (i % 30) / 10 : "", i % 2 ? "3gpp-38.901" : "itu-r-f.1336-sectoral", 65, 7 + (i % 6), (i * 37) % 360, i % 4, (i % 7) + 1, (i % 50) - 25, ((i * 7) % 50) - 25, 3 + (i % 10) / 2, i % 5 ? "spherical" : "cylindrical", i % 5 ? "" : 1.4, 1, i % 6 === 5 ? 0.25 : 1, i % 6 === 5 ? 0.74 : 1, i % 17 ? "yes" : "no", `bench row ${i + 1}`].join(","));
  }
  return lines.join("\r\n");
}

const org = randomUUID();
const user = randomUUID();
const site = randomUUID();
await sql`insert into organization (id, name, slug) values (${org}, 'Emitter bench', ${`emitter-bench-${org.slice(0, 8)}`})`;
await sql`insert into "user" (id, name, email, email_verified) values (${user}, 'Bench Engineer', ${`bench-${org}@bench.test`}, true)`;
await sql`insert into member (id, organization_id, user_id, role) values (${randomUUID()}, ${org}, ${user}, 'engineer')`;
await sql`insert into site (id, organization_id, name, kind) values (${site}, ${org}, 'Emitter bench site', 'rooftop')`;
const who = { organizationId: org, role: "engineer", clientId: null, userId: user };
const bytes = new TextEncoder().encode(csv(rows));
const ms = (t0) => (performance.now() - t0).toFixed(0);

try {
  console.log(`emitter CSV: ${rows} rows, ${(bytes.byteLength / 1024).toFixed(0)} KiB; machine: ${cpus().length} cores, load average ${loadavg().map((l) => l.toFixed(1)).join(" / ")}`);
  let t0 = performance.now();
  const checked = emittersFromCsvBytes(bytes, []);
  console.log(`  check only (papaparse + field rules): ${ms(t0)} ms, ${checked.valid.length} valid, ${checked.problems.length} problems`);
  const times = [];
  for (let run = 1; run <= 3; run++) {
    t0 = performance.now();
    const result = await importEmitters(who, site, bytes, { mode: "replace" });
    times.push(performance.now() - t0);
    console.log(`  import run ${run} (feature function, replace, one transaction): ${times.at(-1).toFixed(0)} ms, ${result.count} stored, ${result.deleted} replaced`);
  }
  times.sort((a, b) => a - b);
  console.log(`  median of 3: ${times[1].toFixed(0)} ms`);
  const [{ n }] = await sql`select count(*)::int as n from emitter where site_id = ${site}`;
  const [{ a }] = await sql`select count(*)::int as a from audit_event where site_id = ${site} and subject_type = 'emitter'`;
  console.log(`  stored emitters now: ${n}; audit rows for the site: ${a}`);

  const base = process.env.APP_URL?.replace(/\/$/, "");
  const secret = process.env.BETTER_AUTH_SECRET;
  const up = base ? await fetch(`${base}/api/health`).then((r) => r.ok).catch(() => false) : false;
  if (up && secret) {
    const token = randomBytes(24).toString("base64url");
    await sql`insert into session (id, token, user_id, expires_at, active_organization_id) values (${randomUUID()}, ${token}, ${user}, now() + interval '1 hour', ${org})`;
    const cookie = `better-auth.session_token=${encodeURIComponent(`${token}.${createHmac("sha256", secret).update(token).digest("base64")}`)}`;
    t0 = performance.now();
    const response = await fetch(`${base}/api/v1/sites/${site}/emitters/csv?mode=replace`, { method: "POST", body: bytes, headers: { cookie, origin: base, "content-type": "text/csv" } });
    const answer = await response.json();
    console.log(`  over HTTP (POST ${base}/api/v1/sites/:id/emitters/csv?mode=replace): ${ms(t0)} ms, status ${response.status}, ${answer.count ?? 0} stored`);
  } else {
    console.log("  over HTTP: skipped (start with WITH_APP=1 to measure it)");
  }
} finally {
  await sql`delete from organization where id = ${org}`;
  await sql`delete from "user" where id = ${user}`;
  await sql.end();
  await db.$client?.end?.();
}
