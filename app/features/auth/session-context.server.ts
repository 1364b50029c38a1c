// Who is signed in, resolved at most once per request. The root middleware puts a lazy lookup into
// React Router's request context; the layout's loader and the page's guard share it, and a page
// that never asks costs nothing. Where no middleware ran (loaders called directly, as the
// integration tests do) the lookup is kept per Request object instead.
import { asc, eq } from "drizzle-orm";
import { createContext, type MiddlewareFunction } from "react-router";
import { auth } from "~/features/auth/auth.server";
import { db, schema } from "~/infra/db.server";
import { isRole, type Role } from "~/lib/roles";
import { readSessionFast, type FastRead } from "./fast-session.server";

export type SignedIn = Awaited<ReturnType<typeof auth.api.getSession>>;
export type Membership = NonNullable<Awaited<ReturnType<typeof findMembership>>>;
export type SessionLookup = { signedIn: () => Promise<SignedIn>; membership: () => Promise<Membership | null> };

/** The user's membership: the session's active organisation, else the oldest; a client member's bound client. */
export async function findMembership(userId: string, activeOrganizationId?: string | null) {
  const rows = await db
    .select({
      memberId: schema.member.id,
      role: schema.member.role,
      organizationId: schema.organization.id,
      organizationName: schema.organization.name,
      clientId: schema.clientMember.clientId,
    })
    .from(schema.member)
    .innerJoin(schema.organization, eq(schema.organization.id, schema.member.organizationId))
    .leftJoin(schema.clientMember, eq(schema.clientMember.memberId, schema.member.id))
    .where(eq(schema.member.userId, userId))
    .orderBy(asc(schema.member.createdAt));
  const row = rows.find((r) => r.organizationId === activeOrganizationId) ?? rows[0];
  if (!row || !isRole(row.role)) return null;
  return { ...row, role: row.role as Role };
}

/**
 * A lookup that asks on first use only: one joined query for the common signed-in case
 * (fast-session.server.ts), better-auth and the membership query for everything else.
 */
export function sessionLookup(request: Request): SessionLookup {
  let fast: Promise<FastRead | undefined> | undefined;
  let signedIn: Promise<SignedIn> | undefined;
  let membership: Promise<Membership | null> | undefined;
  const fastRead = () => (fast ??= readSessionFast(request.headers));
  const lookup: SessionLookup = {
    signedIn: () => (signedIn ??= fastRead().then((f) => (f ? f.signedIn : auth.api.getSession({ headers: request.headers })))),
    membership: () =>
      (membership ??= fastRead().then((f) =>
        f ? f.membership : lookup.signedIn().then((s) => (s ? findMembership(s.user.id, s.session.activeOrganizationId) : null)),
      )),
  };
  return lookup;
}

export const sessionContext = createContext<SessionLookup | null>(null);

/** Root middleware: one lookup per request. */
export const sessionMiddleware: MiddlewareFunction<Response> = ({ request, context }) => {
  context.set(sessionContext, sessionLookup(request));
};

export type GuardArgs = Request | { request: Request; context?: unknown };

const byRequest = new WeakMap<Request, SessionLookup>();

function perRequest(request: Request) {
  let lookup = byRequest.get(request);
  if (!lookup) byRequest.set(request, (lookup = sessionLookup(request)));
  return lookup;
}

/** The request's shared lookup: from the middleware's context, else kept per Request object. */
export function lookupOf(args: GuardArgs): SessionLookup {
  if (args instanceof Request) return perRequest(args);
  const context = args.context as { get?: (key: typeof sessionContext) => SessionLookup | null } | undefined;
  return (typeof context?.get === "function" ? context.get(sessionContext) : null) ?? perRequest(args.request);
}
