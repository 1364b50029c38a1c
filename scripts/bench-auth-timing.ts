// Prints how long the answers take that must not reveal whether an address has an account:
// password-reset requests and sign-ups, for known and unknown addresses. Figures only, no verdict.
//   npm run -s with-stack -- npx tsx scripts/bench-auth-timing.ts [rounds]
import { randomUUID } from "node:crypto";
import { auth } from "../app/features/auth/auth.server";
import { callAuth } from "../app/features/auth/call.server";
import { CLIENT_ADDRESS_HEADER } from "../app/infra/client-address.server";
import { db, schema, sql } from "../app/infra/db.server";
import { env } from "../app/infra/env.server";

const rounds = Number(process.argv[2] ?? 25);
let n = 0;
const request = () =>
  new Request(env.APP_URL, { headers: { origin: env.APP_URL, [CLIENT_ADDRESS_HEADER]: `198.18.${(n >> 8) & 255}.${n++ & 255}` } });

async function makeAccount(email: string) {
  const hash = await (await auth.$context).password.hash("bench-Password-1");
  const id = randomUUID();
  await db.insert(schema.user).values({ id, name: "Bench", email, emailVerified: true });
  await db.insert(schema.account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: hash });
}

async function time(run: () => Promise<unknown>) {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

function summary(label: string, ms: number[]) {
  const sorted = [...ms].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))].toFixed(1);
  console.log(`${label.padEnd(34)} n=${String(sorted.length).padStart(3)}  median ${at(0.5).padStart(7)} ms  p90 ${at(0.9).padStart(7)} ms`);
}

const known: string[] = [];
for (let i = 0; i < rounds; i++) {
  known.push(`bench-${randomUUID()}@bench.test`);
  await makeAccount(known[i]);
}
const figures: Record<string, number[]> = { resetKnown: [], resetUnknown: [], signUpTaken: [], signUpNew: [] };
// Interleaved, so a slow moment of the machine hits both sides alike.
for (let i = 0; i < rounds; i++) {
  figures.resetKnown.push(await time(() => callAuth(request(), "/request-password-reset", { email: known[i], redirectTo: "/reset-password" })));
  figures.resetUnknown.push(await time(() => callAuth(request(), "/request-password-reset", { email: `nobody-${randomUUID()}@bench.test`, redirectTo: "/reset-password" })));
  const body = { name: "Bench", password: "bench-Password-2", callbackURL: "/verified" };
  figures.signUpTaken.push(await time(() => callAuth(request(), "/sign-up/email", { ...body, email: known[i] })));
  figures.signUpNew.push(await time(() => callAuth(request(), "/sign-up/email", { ...body, email: `new-${randomUUID()}@bench.test` })));
}
summary("password reset, known address", figures.resetKnown);
summary("password reset, unknown address", figures.resetUnknown);
summary("sign-up, taken address", figures.signUpTaken);
summary("sign-up, new address", figures.signUpNew);
await new Promise((r) => setTimeout(r, 1000)); // let the queued mails go out before closing
await sql.end();
process.exit(0);
