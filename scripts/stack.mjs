// The local stack behind `npm start`, `npm run dev` and `npm test`: PostgreSQL in a
// project folder, the mail catcher, the payment fake, migrations, the demo seed,
// then the app (start/dev) or every test suite (test). Plain Node, no build step.
import { spawn, spawnSync } from "node:child_process";
import { createHash, randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync, chmodSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { setTimeout as sleep } from "node:timers/promises";

const root = resolve(import.meta.dirname, "..");
// start | dev | test | with (test services, then the command after `--`)
const mode0 = process.argv[2] ?? "start";
const withCommand = mode0 === "with" ? process.argv.slice(process.argv.indexOf("--") + 1) : null;
const mode = mode0 === "with" ? "test" : mode0;
const isRoot = process.getuid?.() === 0;

const profiles = {
  start: { pgPort: 54329, db: "isotrope", smtp: 1025, mailWeb: 1080, stripe: 12111, app: 3000 },
  test: { pgPort: 54339, db: "isotrope_test", smtp: 1035, mailWeb: 1090, stripe: 12121, app: 3100 },
};
const profile = mode === "test" ? profiles.test : profiles.start;
// The test build goes to its own folder so that `npm test` never replaces the assets of a running `npm start`.
const buildDir = mode === "test" ? "build-test" : "build";
process.env.BUILD_DIR = buildDir;
const num = (name, fallback) => Number(process.env[name] ?? fallback);
const ports = {
  pg: num(mode === "test" ? "TEST_PG_PORT" : "PG_PORT", profile.pgPort),
  smtp: num(mode === "test" ? "TEST_SMTP_PORT" : "SMTP_PORT", profile.smtp),
  mailWeb: num(mode === "test" ? "TEST_MAIL_WEB_PORT" : "MAIL_WEB_PORT", profile.mailWeb),
  stripe: num(mode === "test" ? "TEST_STRIPE_PORT" : "STRIPE_PORT", profile.stripe),
  app: num(mode === "test" ? "TEST_PORT" : "PORT", profile.app),
};

const children = [];
const cleanups = [];
let stopping = false;

function log(message) {
  console.log(`\x1b[36m[isotrope]\x1b[0m ${message}`);
}

function fail(message) {
  console.error(`\x1b[31m[isotrope]\x1b[0m ${message}`);
  shutdown(1);
}

function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: options.quiet ? "pipe" : "inherit", encoding: "utf8", ...options });
  if (result.status !== 0 && !options.allowFail) {
    fail(`${command} ${args.join(" ")} failed${result.stderr ? `:\n${result.stderr}` : ""}`);
  }
  return result;
}

function background(name, command, args, env) {
  const child = spawn(command, args, { cwd: root, env: { ...process.env, ...env }, stdio: ["ignore", "pipe", "pipe"] });
  const tag = `[${name}] `;
  const forward = (stream, out) =>
    stream.on("data", (chunk) => {
      if (process.env.STACK_QUIET && name !== "app") return;
      out.write(chunk.toString().replace(/^(?=.)/gm, tag));
    });
  forward(child.stdout, process.stdout);
  forward(child.stderr, process.stderr);
  child.on("exit", (code) => {
    if (!stopping) fail(`${name} stopped unexpectedly (exit ${code}).`);
  });
  children.push(child);
  return child;
}

async function waitForHttp(url, what, seconds = 30) {
  for (let i = 0; i < seconds * 4; i++) {
    try {
      const response = await fetch(url);
      if (response.status < 500) return;
    } catch {}
    await sleep(250);
  }
  fail(`${what} did not answer at ${url} within ${seconds} s.`);
}

// ---------- PostgreSQL ----------

function findPgBin() {
  const base = "/usr/lib/postgresql";
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(join(base, v, "bin", "initdb")))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(base, versions[0], "bin") : null;
}

function ensurePgInstalled() {
  let bin = process.env.PG_BIN ?? findPgBin();
  if (bin) return bin;
  if (!isRoot) fail("PostgreSQL's server is not installed. Install Debian's package:  sudo apt-get install -y postgresql  (or set DATABASE_URL).");
  log("installing PostgreSQL from Debian's packages …");
  run("apt-get", ["update", "-qq"]);
  run("apt-get", ["install", "-y", "-qq", "postgresql"], { env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
  bin = findPgBin();
  if (!bin) fail("PostgreSQL was installed but its binaries were not found under /usr/lib/postgresql.");
  return bin;
}

/** As root, PostgreSQL runs as the `postgres` user; its data folder must be reachable by it. */
function pgDataDir(name) {
  const local = join(root, ".data", name);
  if (!isRoot) return local;
  mkdirSync(local, { recursive: true });
  run("chown", ["postgres:postgres", local]);
  const reachable = spawnSync("runuser", ["-u", "postgres", "--", "test", "-w", local]).status === 0;
  if (reachable) return local;
  const fallback = join(tmpdir(), `isotrope-${createHash("sha256").update(root).digest("hex").slice(0, 12)}-${name}`);
  mkdirSync(fallback, { recursive: true });
  run("chown", ["postgres:postgres", fallback]);
  log(`the postgres user cannot reach ${local}; using ${fallback}`);
  return fallback;
}

function asPg(bin, tool, args, options = {}) {
  const command = join(bin, tool);
  return isRoot ? run("runuser", ["-u", "postgres", "--", command, ...args], options) : run(command, args, options);
}

async function startPostgres() {
  const bin = ensurePgInstalled();
  const dir = pgDataDir(mode === "test" ? "pg-test" : "pg");
  if (!existsSync(join(dir, "PG_VERSION"))) {
    log(`creating a PostgreSQL cluster in ${dir}`);
    asPg(bin, "initdb", ["-D", dir, "-U", "isotrope", "--auth=trust", "--encoding=UTF8", "--no-locale"], { quiet: true });
  }
  const status = asPg(bin, "pg_ctl", ["-D", dir, "status"], { quiet: true, allowFail: true });
  if (status.status === 0) {
    log(`PostgreSQL already running from ${dir}; reusing it`);
  } else {
    const options = `-p ${ports.pg} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=${mode === "test" ? "off" : "on"}`;
    asPg(bin, "pg_ctl", ["-D", dir, "-l", join(dir, "server.log"), "-o", options, "-w", "-t", "60", "start"], { quiet: true });
    cleanups.push(() => asPg(bin, "pg_ctl", ["-D", dir, "-m", "fast", "-w", "stop"], { quiet: true, allowFail: true }));
    log(`PostgreSQL on 127.0.0.1:${ports.pg}`);
  }
  const psql = (sql, db = "postgres") =>
    run(join(bin, "psql"), ["-h", "127.0.0.1", "-p", String(ports.pg), "-U", "isotrope", "-d", db, "-tAc", sql], { quiet: true });
  const exists = psql(`select 1 from pg_database where datname = '${profile.db}'`).stdout.trim() === "1";
  if (mode === "test" && exists) psql(`drop database "${profile.db}" with (force)`);
  if (mode === "test" || !exists) psql(`create database "${profile.db}"`);
  return `postgres://isotrope@127.0.0.1:${ports.pg}/${profile.db}`;
}

async function migrate(databaseUrl) {
  const { default: postgres } = await import("postgres");
  const { drizzle } = await import("drizzle-orm/postgres-js");
  const { migrate } = await import("drizzle-orm/postgres-js/migrator");
  const sql = postgres(databaseUrl, { max: 1, onnotice: () => {} });
  try {
    await migrate(drizzle(sql), { migrationsFolder: join(root, "drizzle") });
  } finally {
    await sql.end();
  }
  // The job queue's own tables (pg-boss, schema "pgboss"), so every app server and worker finds them.
  const { default: PgBoss } = await import("pg-boss");
  const boss = new PgBoss({ connectionString: databaseUrl, schema: "pgboss", supervise: false, schedule: false, max: 1 });
  await boss.start();
  await boss.stop({ graceful: false, wait: true });
  log("migrations applied");
}

// ---------- mail catcher and payment fake ----------

async function startMail() {
  background("mail", join(root, "node_modules/.bin/maildev"), [
    "--smtp", String(ports.smtp), "--ip", "127.0.0.1",
    "--web", String(ports.mailWeb), "--web-ip", "127.0.0.1", "--silent",
    "--mail-directory", join(root, ".data", `mail-${mode === "test" ? "test" : "start"}`),
  ]);
  await waitForHttp(`http://127.0.0.1:${ports.mailWeb}/api/healthz`, "the mail catcher");
  return { smtp: `smtp://127.0.0.1:${ports.smtp}`, web: `http://127.0.0.1:${ports.mailWeb}` };
}

// The payment settings (README "Payments"): the local fake by default; a real Stripe test account
// when STRIPE_SECRET_KEY is set to another key and STRIPE_API_BASE is unset (start/dev only).
function stripeSettings(appUrl) {
  const local = { secretKey: "sk_test_isotrope_local", webhookSecret: "whsec_isotrope_local" };
  if (mode === "test") return { ...local, fake: true, apiBase: null };
  const secretKey = process.env.STRIPE_SECRET_KEY || local.secretKey;
  const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET || local.webhookSecret;
  const apiBase = process.env.STRIPE_API_BASE || null;
  const real = !apiBase && secretKey !== local.secretKey;
  return { secretKey, webhookSecret, fake: !apiBase && !real, apiBase, webhookUrl: process.env.STRIPE_WEBHOOK_URL || `${appUrl}/api/stripe/webhook` };
}

async function startStripeFake(settings, appUrl) {
  const base = `http://127.0.0.1:${ports.stripe}`;
  background("payments", process.execPath, [join(root, "mocks/stripe-server.mjs"), String(ports.stripe)], {
    STRIPE_SECRET_KEY: settings.secretKey,
    STRIPE_WEBHOOK_SECRET: settings.webhookSecret,
    STRIPE_API_BASE: base,
    STRIPE_WEBHOOK_URL: settings.webhookUrl ?? `${appUrl}/api/stripe/webhook`,
  });
  await waitForHttp(`${base}/_fake/health`, "the payment fake");
  return base;
}

function authSecret() {
  if (process.env.BETTER_AUTH_SECRET) return process.env.BETTER_AUTH_SECRET;
  const file = join(root, ".data", "auth-secret");
  if (!existsSync(file)) {
    mkdirSync(join(root, ".data"), { recursive: true });
    writeFileSync(file, randomBytes(32).toString("hex"));
    chmodSync(file, 0o600);
  }
  return readFileSync(file, "utf8").trim();
}

// ---------- the app and the suites ----------

async function services() {
  const databaseUrl = process.env.DATABASE_URL && mode !== "test" ? process.env.DATABASE_URL : await startPostgres();
  await migrate(databaseUrl);
  const mail = process.env.SMTP_URL && mode !== "test" ? { smtp: process.env.SMTP_URL, web: null } : await startMail();
  const baseUrl = `http://127.0.0.1:${ports.app}`;
  const appUrl = process.env.APP_URL && mode !== "test" ? process.env.APP_URL : baseUrl;
  const payments = stripeSettings(appUrl);
  // STRIPE_API_BASE "" means Stripe itself (the SDK's own host).
  const stripe = payments.fake ? await startStripeFake(payments, appUrl) : (payments.apiBase ?? "");
  const env = {
    DATABASE_URL: databaseUrl,
    SMTP_URL: mail.smtp,
    MAILDEV_API: mail.web ?? "",
    STRIPE_API_BASE: stripe,
    STRIPE_SECRET_KEY: payments.secretKey,
    STRIPE_WEBHOOK_SECRET: payments.webhookSecret,
    APP_URL: appUrl,
    PORT: String(ports.app),
    BETTER_AUTH_SECRET: mode === "test" ? "isotrope-test-secret-0123456789abcdef0123456789" : authSecret(),
  };
  Object.assign(process.env, env);
  seedDemo();
  return { env, mail };
}

function seedDemo() {
  const seed = run(join(root, "node_modules/.bin/tsx"), [join(root, "scripts/seed.ts")], { env: process.env, quiet: true, allowFail: true });
  if (seed.status !== 0) fail(`seeding failed:\n${seed.stdout}${seed.stderr}`);
  process.stdout.write(seed.stdout.replace(/^(?=.)/gm, "[seed] "));
}

/**
 * The browser tests' own database, made afresh on the same server, migrated and seeded. The
 * integration tests leave documents queued in theirs (no worker runs then), and an app started on
 * it would render all of those first while the browser tests wait for their own PDFs.
 */
async function freshDatabase(databaseUrl, name) {
  const { default: postgres } = await import("postgres");
  const admin = new URL(databaseUrl);
  admin.pathname = "/postgres";
  const sql = postgres(admin.toString(), { max: 1, onnotice: () => {} });
  try {
    await sql.unsafe(`drop database if exists "${name}" with (force)`);
    await sql.unsafe(`create database "${name}"`);
  } finally {
    await sql.end();
  }
  const url = new URL(databaseUrl);
  url.pathname = `/${name}`;
  await migrate(url.toString());
  process.env.DATABASE_URL = url.toString();
  seedDemo();
  return url.toString();
}

async function startApp(env) {
  // server/index.mjs: the same gate in development (Vite in middleware mode) and production (the build).
  const server = join(root, "server/index.mjs");
  if (mode === "dev") {
    background("app", process.execPath, [server, "--dev"], { ...env, HOST: process.env.HOST ?? "127.0.0.1", NODE_ENV: "development" });
  } else {
    if (mode !== "test") run("npm", ["run", "-s", "build"], { cwd: root });
    const host = mode === "test" ? "127.0.0.1" : (process.env.HOST ?? "127.0.0.1");
    // A larger young generation: a signed-in page allocates a few MB, and fewer scavenges measured
    // ~0.6–0.9 ms less server CPU per overview request (docs/decisions/0009).
    const app = background("app", process.execPath, ["--max-semi-space-size=64", server], { ...env, HOST: host, NODE_ENV: "production", BUILD_DIR: buildDir });
    process.env.APP_PID = String(app.pid); // for `with-stack -- npm run bench:http` (server CPU per request)
  }
  await waitForHttp(`${env.APP_URL}/api/health`, "the app", 120);
}

const DEMO = ["owner", "engineer", "reviewer", "billing", "client", "regulator"].map((r) => `${r}@demo.isotrope.test`);

async function start() {
  const { env, mail } = await services();
  await startApp(env);
  console.log(`
  Isotrope is running.
    app            ${env.APP_URL}
    mail catcher   ${mail.web ?? env.SMTP_URL}
    payments       ${env.STRIPE_API_BASE ? `${env.STRIPE_API_BASE} (local fake; its events → ${env.APP_URL}/api/stripe/webhook)` : "Stripe (test account from STRIPE_SECRET_KEY)"}
  Demo sign-ins (password: ${process.env.DEMO_PASSWORD ?? "isotrope-demo"}):
    ${DEMO.join("\n    ")}
    engineer@second.isotrope.test   (a second organisation)
  Ctrl-C stops everything this command started.
`);
}

/** Runs a command to its end without blocking this process, so the app's output keeps being
 * forwarded meanwhile (a blocked pipe would stall the app's own writes to it). */
function runInherit(command, args, env) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd: root, stdio: "inherit", env });
    children.push(child); // stopped with the services if one of them fails meanwhile
    const done = (code) => {
      const i = children.indexOf(child);
      if (i >= 0) children.splice(i, 1);
      resolve(code);
    };
    child.on("error", () => done(1));
    child.on("exit", (code, signal) => done(code ?? (signal ? 1 : 0)));
  });
}

async function suite(name, command, args, env = {}) {
  log(`── ${name}`);
  return (await runInherit(command, args, { ...process.env, ...env })) === 0;
}

function readJson(file) {
  try {
    return JSON.parse(readFileSync(file, "utf8"));
  } catch {
    return null;
  }
}

async function test() {
  if (!existsSync("/usr/bin/chromium")) {
    if (!isRoot) fail("Debian's chromium is needed for the browser tests:  sudo apt-get install -y chromium");
    log("installing Chromium from Debian's packages …");
    run("apt-get", ["update", "-qq"]);
    run("apt-get", ["install", "-y", "-qq", "chromium"], { env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
  }
  if (!existsSync("/usr/bin/pdftotext")) {
    if (!isRoot) fail("Debian's poppler-utils (pdftotext, pdftoppm) is needed for the document tests:  sudo apt-get install -y poppler-utils");
    run("apt-get", ["install", "-y", "-qq", "poppler-utils"], { env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
  }
  process.env.STACK_QUIET = "1";
  const { env } = await services();
  const out = join(root, "test-results");
  mkdirSync(out, { recursive: true });
  const bin = (name) => join(root, "node_modules/.bin", name);
  const counts = { passed: 0, failed: 0 };
  let ok = true;

  const typecheck = await suite("typecheck", "npm", ["run", "-s", "typecheck"]);
  counts[typecheck ? "passed" : "failed"] += 1;

  const vitestOk = await suite("vitest (unit and integration)", bin("vitest"), ["run", "--reporter=default", "--reporter=json", `--outputFile=${join(out, "vitest.json")}`]);
  const vitest = readJson(join(out, "vitest.json"));
  counts.passed += vitest?.numPassedTests ?? 0;
  counts.failed += vitest ? vitest.numFailedTests : 1;
  ok &&= typecheck && vitestOk;

  const build = await suite("build", "npm", ["run", "-s", "build"]);
  counts[build ? "passed" : "failed"] += 1;
  if (build) {
    const e2eDatabase = await freshDatabase(env.DATABASE_URL, `${profile.db}_e2e`);
    await startApp({ ...env, DATABASE_URL: e2eDatabase, SIGN_IN_LIMIT: "500" });
    const e2eOk = await suite("playwright (Chromium)", bin("playwright"), ["test", "-c", "tests/e2e/playwright.config.ts"], {
      PLAYWRIGHT_JSON_OUTPUT_NAME: join(out, "playwright.json"),
      PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: "1",
    });
    const pw = readJson(join(out, "playwright.json"));
    counts.passed += pw?.stats ? pw.stats.expected + pw.stats.flaky : 0;
    counts.failed += pw?.stats ? pw.stats.unexpected : 1;
    ok &&= e2eOk;
  }
  ok &&= build && counts.failed === 0;
  console.log(`\n${counts.passed} passed, ${counts.failed} failed`);
  shutdown(ok ? 0 : 1);
}

function shutdown(code) {
  if (stopping) return;
  stopping = true;
  for (const child of children) child.kill("SIGTERM");
  for (const cleanup of cleanups.reverse()) cleanup();
  process.exit(code);
}

process.on("SIGINT", () => shutdown(130));
process.on("SIGTERM", () => shutdown(143));

async function withServices() {
  process.env.STACK_QUIET = "1";
  const { env } = await services();
  if (withCommand.length === 0) fail("usage: node scripts/stack.mjs with -- COMMAND [ARGS]");
  if (process.env.WITH_APP) await startApp({ ...env, SIGN_IN_LIMIT: "500" });
  shutdown(await runInherit(withCommand[0], withCommand.slice(1), process.env));
}

if (withCommand) await withServices();
else if (mode === "test") await test();
else await start();
