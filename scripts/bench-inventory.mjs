// Inventory speed at scale: seeds 10 000 sites with 200 000 emitters into a bench organisation of
// the database in DATABASE_URL, then measures with autocannon, against a running portal:
//   - GET /api/v1/sites (20 connections), p50 / p95 / p99
//   - the site page of a site with 60 emitters (its Layout and Emitters sections)
// and removes the bench organisation afterwards. Prints figures; asserts nothing. Run it on the
// test stack (never on data you care about):
//   BUILD_DIR=build-test npm run -s build && WITH_APP=1 npm run -s with-stack -- node scripts/bench-inventory.mjs
// BENCH_SECONDS (per target, default 10), BENCH_CONNECTIONS (default 20), BENCH_SITES, BENCH_EMITTERS.
// With APP_PID (set by `with-stack` when it starts the app) it also prints the server's CPU time
// per request, the figure a busy machine disturbs least. BENCH_ONLY=<regex> measures only the
// targets whose name matches. BENCH_SEED_ONLY=1 seeds, prints the session cookie, token and site id as
// JSON, and keeps the bench organisation (for profiling by hand; the test stack's database is rebuilt
// by the next `npm test`).
import { createHash, createHmac, randomBytes, randomUUID } from "node:crypto";
import autocannon from "autocannon";
import postgres from "postgres";
import { serverCpuMs } from "./bench-support.mjs";

const base = (process.env.APP_URL ?? "http://127.0.0.1:3100").replace(/\/$/, "");
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const defaultConnections = Number(process.env.BENCH_CONNECTIONS ?? 20);
// The site pages again at each of these connection counts (p95 at 20 connections on 2 cores is mostly
// queueing: about 20 × the page's CPU time). BENCH_SWEEP="" skips the sweep.
const sweep = (process.env.BENCH_SWEEP ?? "1,5,10").split(",").filter(Boolean).map(Number);
const siteCount = Number(process.env.BENCH_SITES ?? 10_000);
const emitterCount = Number(process.env.BENCH_EMITTERS ?? 200_000);
const secret = process.env.BETTER_AUTH_SECRET;
if (!process.env.DATABASE_URL || !secret) throw new Error("Run through `npm run with-stack` (DATABASE_URL and BETTER_AUTH_SECRET are needed).");
const sql = postgres(process.env.DATABASE_URL, { max: 2, onnotice: () => {} });

async function seed() {
  const org = randomUUID();
  const user = randomUUID();
  const member = randomUUID();
  const t0 = performance.now();
  await sql.begin(async (tx) => {
    await tx`insert into organization (id, name, slug) values (${org}, 'Bench Org', ${`bench-${org.slice(0, 8)}`})`;
    await tx`insert into "user" (id, name, email, email_verified) values (${user}, 'Bench Engineer', ${`bench-${org}@bench.test`}, true)`;
    await tx`insert into member (id, organization_id, user_id, role) values (${member}, ${org}, ${user}, 'engineer')`;
    await tx`insert into client (id, organization_id, name) select gen_random_uuid()::text, ${org}, 'Bench client ' || g from generate_series(1, 200) g`;
    await tx`
      insert into site (id, organization_id, client_id, name, kind, city, address)
      select gen_random_uuid()::text, ${org},
             (select id from client where organization_id = ${org} order by name offset (g % 200) limit 1),
             'Bench site ' || lpad(g::text, 5, '0'),
             (array['rooftop','tower','monopole','street-pole','water-tank','other'])[1 + g % 6],
             (array['Port Ellery','Marrow Bay','Kiln Cross','Saltings','Wexcombe'])[1 + g % 5],
             g || ' Bench Street'
      from generate_series(1, ${siteCount}) g`;
    // Emitters spread over the sites; the first site gets exactly 60 for the page measurement.
    await tx`
      with s as (select id, row_number() over (order by name) as n from site where organization_id = ${org})
      insert into emitter (id, organization_id, site_id, position, label, operator, frequency_mhz, power_per_carrier_w, gain_dbi, x, y, z, azimuth_deg)
      select gen_random_uuid()::text, ${org}, s.id, e, 'E' || e, 'Bench operator ' || (e % 3), 1900, 40, 16, e % 20, e / 20, 3, (e * 40) % 360
      from s cross join lateral generate_series(1, case when s.n = 1 then 60 else ${Math.floor((emitterCount - 60) / Math.max(1, siteCount - 1))} end) e`;
  });
  // A freshly bulk-loaded table has no visibility map yet, so counts read the heap; on a running
  // database autovacuum has done this long before anyone lists 10 000 sites.
  await sql`vacuum analyze site`;
  await sql`vacuum analyze emitter`;
  const [counts] = await sql`select (select count(*)::int from site where organization_id = ${org}) as sites, (select count(*)::int from emitter where organization_id = ${org}) as emitters`;
  const [sixty] = await sql`select site.id from site where organization_id = ${org} order by name limit 1`;
  const token = randomBytes(24).toString("base64url");
  await sql`insert into session (id, token, user_id, expires_at, active_organization_id) values (${randomUUID()}, ${token}, ${user}, now() + interval '1 hour', ${org})`;
  const signature = createHmac("sha256", secret).update(token).digest("base64");
  const apiToken = `iso_${randomBytes(32).toString("base64url")}`;
  await sql`insert into api_token (id, organization_id, member_id, user_id, name, token_hash, prefix) values (${randomUUID()}, ${org}, ${member}, ${user}, 'bench', ${createHash("sha256").update(apiToken).digest("hex")}, ${apiToken.slice(0, 10)})`;
  console.log(`seeded ${counts.sites} sites and ${counts.emitters} emitters in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  return { org, cookie: `better-auth.session_token=${encodeURIComponent(`${token}.${signature}`)}`, apiToken, siteId: sixty.id };
}


/** One autocannon run that keeps every response time, for exact percentiles. */
function measure(name, path, headers, connections = defaultConnections) {
  return new Promise((resolve, reject) => {
    const times = [];
    let bad = 0;
    const cpuBefore = serverCpuMs();
    const instance = autocannon({ url: `${base}${path}`, connections, duration: seconds, headers }, (error, result) => {
      if (error) return reject(error);
      times.sort((a, b) => a - b);
      const at = (p) => times[Math.min(times.length - 1, Math.floor((p / 100) * times.length))];
      const cpuAfter = serverCpuMs();
      const cpu = cpuBefore !== null && cpuAfter !== null ? { "server CPU ms/req": Number(((cpuAfter - cpuBefore) / Math.max(1, times.length)).toFixed(2)) } : {};
      resolve({ target: name, conns: connections, "req/s": Math.round(result.requests.average), p50: at(50).toFixed(1), p95: at(95).toFixed(1), p99: at(99).toFixed(1), "non-2xx": bad + result.non2xx, ...cpu });
    });
    instance.on("response", (_client, status, _bytes, ms) => {
      times.push(ms);
      if (status >= 400) bad++;
    });
  });
}

async function main() {
  const { org, cookie, apiToken, siteId } = await seed();
  if (process.env.BENCH_SEED_ONLY) {
    // For profiling by hand: keep the bench organisation and print what reaches it.
    console.log(JSON.stringify({ org, cookie, apiToken, siteId }));
    return await sql.end();
  }
  try {
    const targets = [
      ["GET /api/v1/sites (token)", "/api/v1/sites", { authorization: `Bearer ${apiToken}` }],
      ["GET /api/v1/sites?q=site 09&page=3", "/api/v1/sites?q=site%2009&page=3", { authorization: `Bearer ${apiToken}` }],
      ["GET /api/v1/sites (session, sorted by emitters)", "/api/v1/sites?sort=emitters&dir=desc", { cookie }],
      ["site page, 60 emitters: Layout", `/sites/${siteId}`, { cookie }],
      ["site page, 60 emitters: Emitters", `/sites/${siteId}/emitters`, { cookie }],
      ["GET /api/v1/sites/:id (60 emitters)", `/api/v1/sites/${siteId}`, { cookie }],
    ];
    for (const [, path, headers] of targets) {
      const check = await fetch(`${base}${path}`, { headers, redirect: "manual" });
      if (check.status !== 200) console.log(`warning: ${path} answered ${check.status}`);
    }
    const rows = [];
    const only = process.env.BENCH_ONLY ? new RegExp(process.env.BENCH_ONLY, "i") : null;
    for (const [name, path, headers] of targets) if (!only || only.test(name)) rows.push(await measure(name, path, headers));
    for (const c of sweep) for (const [name, path, headers] of targets) if (name.startsWith("site page") && (!only || only.test(name))) rows.push(await measure(name, path, headers, c));
    console.log(`${base}, ${defaultConnections} connections unless "conns" says otherwise, ${seconds} s each (latencies in ms):`);
    console.table(rows);
  } finally {
    await sql`delete from organization where id = ${org}`;
    await sql.end();
  }
}

await main();
