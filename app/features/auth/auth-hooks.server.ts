// better-auth's before/after hooks: every call of its endpoints, from our pages (callAuth) or
// straight at /api/auth, passes the forms' Zod limits and the throttles here.
import { APIError, createAuthMiddleware, getSessionFromCtx, isAPIError } from "better-auth/api";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { apiBodyRules, describeIssues } from "./api-rules";
import { OWN_CODES } from "./auth-messages";
import { tooManyFailures, tooManyMails, policies } from "./throttle-policy";
import { clearThrottle, passwordSucceeded, takeAttempt, takePasswordAttempt, throttleKeys } from "./throttle.server";

// These answers come no sooner than this, so the database work that only a known (reset) or
// only a new (sign-up) address causes can't be timed from outside. Mails go out afterwards.
// Figures: scripts/bench-auth-timing.ts.
const answerFloorMs: Record<string, number> = { "/request-password-reset": 300, "/sign-up/email": 700 };
const started = new WeakMap<Request, number>();

type HookContext = { path?: string; body?: unknown; headers?: Headers; request?: Request; context: { returned?: unknown } };

const clientOf = (ctx: HookContext) => ctx.headers?.get(CLIENT_ADDRESS_HEADER) ?? ctx.request?.headers.get(CLIENT_ADDRESS_HEADER) ?? "unknown";

function refuse(waitSeconds: number, message: (s: number) => string): never {
  throw new APIError("TOO_MANY_REQUESTS", { code: OWN_CODES.throttled, message: message(waitSeconds) }, { "Retry-After": String(waitSeconds) });
}

/** The e-mail whose password is being tried: the body's for sign-in, the session's for a change. */
async function passwordOwner(ctx: HookContext, body: Record<string, unknown>): Promise<string | null> {
  if (ctx.path === "/sign-in/email") return typeof body.email === "string" ? body.email : null;
  const session = await getSessionFromCtx(ctx as never).catch(() => null);
  return session?.user.email ?? null;
}

async function throttle(ctx: HookContext, body: Record<string, unknown>) {
  const client = clientOf(ctx);
  switch (ctx.path) {
    case "/sign-in/email":
    case "/change-password": {
      const email = await passwordOwner(ctx, body);
      if (!email) return;
      const wait = await takePasswordAttempt(email, client);
      if (wait) refuse(wait, tooManyFailures);
      return;
    }
    case "/reset-password": {
      const wait = await takeAttempt([{ key: throttleKeys.resetFromAddress(client), policy: policies.resetFromAddress }]);
      if (wait) refuse(wait, tooManyFailures);
      return;
    }
    case "/request-password-reset":
    case "/send-verification-email": {
      if (typeof body.email !== "string") return;
      const kind = ctx.path === "/request-password-reset" ? "reset" : "confirm";
      const wait = await takeAttempt([{ key: throttleKeys.mailsTo(kind, body.email), policy: policies.mailsToAddress }]);
      if (wait) refuse(wait, tooManyMails);
    }
  }
}

export const beforeHook = createAuthMiddleware(async (ctx) => {
  if (ctx.path && answerFloorMs[ctx.path] && ctx.request) started.set(ctx.request, performance.now());
  const rule = ctx.path ? apiBodyRules[ctx.path] : undefined;
  if (!rule) return;
  const parsed = rule.safeParse(ctx.body ?? {});
  if (!parsed.success) throw new APIError("BAD_REQUEST", { code: OWN_CODES.invalid, message: describeIssues(parsed.error) });
  const body = parsed.data as Record<string, unknown>;
  await throttle(ctx as HookContext, body);
  return { context: { body } };
});

/** A right password clears the client's bucket; "not confirmed yet" also proves the password. */
export const afterHook = createAuthMiddleware(async (ctx) => {
  const since = ctx.request && started.get(ctx.request);
  if (ctx.path && since) {
    const left = (answerFloorMs[ctx.path] ?? 0) - (performance.now() - since);
    if (left > 0) await new Promise((resolve) => setTimeout(resolve, left));
  }
  const returned = ctx.context.returned;
  const failed = isAPIError(returned) && (returned.body as { code?: string } | undefined)?.code !== "EMAIL_NOT_VERIFIED";
  if (failed) return;
  const client = clientOf(ctx as HookContext);
  if (ctx.path === "/sign-in/email" && typeof ctx.body?.email === "string") await passwordSucceeded(ctx.body.email, client);
  if (ctx.path === "/change-password") {
    const email = (returned as { user?: { email?: string } } | undefined)?.user?.email;
    if (email) await passwordSucceeded(email, client);
  }
  if (ctx.path === "/reset-password") await clearThrottle(throttleKeys.resetFromAddress(client));
});
