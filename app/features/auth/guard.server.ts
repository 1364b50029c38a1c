// The one guard every loader and action starts with: who is signed in, in which
// organisation, with which role. Queries downstream scope by `member.organizationId`.
import { asc, eq } from "drizzle-orm";
import { data, redirect } from "react-router";
import { auth } from "~/features/auth/auth.server";
import { resolveToken } from "~/features/auth/tokens.server";
import { apiError } from "~/lib/api.server";
import { db, schema } from "~/infra/db.server";
import { isRole, type Role } from "~/lib/roles";

export type SignedIn = Awaited<ReturnType<typeof getSignedIn>>;
export type Member = NonNullable<Awaited<ReturnType<typeof findMembership>>> & { user: NonNullable<SignedIn>["user"] };

export async function getSignedIn(request: Request) {
  return auth.api.getSession({ headers: request.headers });
}

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

function signInRedirect(request: Request) {
  const url = new URL(request.url);
  const back = url.pathname + url.search;
  return redirect(back === "/" ? "/sign-in" : `/sign-in?redirectTo=${encodeURIComponent(back)}`);
}

/** Page guard: redirects to sign-in without a session, to /welcome without an organisation, 403 for other roles. */
export async function requireMember(request: Request, options: { roles?: readonly Role[] } = {}): Promise<Member> {
  const signedIn = await getSignedIn(request);
  if (!signedIn) throw signInRedirect(request);
  const membership = await findMembership(signedIn.user.id, signedIn.session.activeOrganizationId);
  if (!membership) throw redirect("/welcome");
  if (options.roles && !options.roles.includes(membership.role)) {
    throw data({ message: "Your role does not give access to this page." }, { status: 403 });
  }
  return { ...membership, user: signedIn.user };
}

/** Page guard for signed-in users who may not have an organisation yet. */
export async function requireUser(request: Request) {
  const signedIn = await getSignedIn(request);
  if (!signedIn) throw signInRedirect(request);
  return signedIn;
}

/** API guard: a bearer token or a session; JSON 401 / 403 instead of redirects. */
export async function requireApiMember(request: Request, options: { roles?: readonly Role[] } = {}): Promise<Member> {
  const authorization = request.headers.get("authorization");
  const signedIn = authorization ? await signedInByToken(authorization) : await getSignedIn(request);
  if (!signedIn) throw apiError(401, authorization ? "That API token is not valid: it may have been revoked." : "Sign in first, or send an API token (Authorization: Bearer …).");
  const membership = await findMembership(signedIn.user.id, signedIn.session.activeOrganizationId);
  if (!membership) throw apiError(403, "You belong to no organisation.");
  if (options.roles && !options.roles.includes(membership.role)) throw apiError(403, "Your role does not allow this.");
  return { ...membership, user: signedIn.user };
}

/** A token stands for its member in its organisation, with the member's current role. */
async function signedInByToken(authorization: string) {
  const token = await resolveToken(authorization);
  if (!token) return null;
  const [user] = await db.select().from(schema.user).where(eq(schema.user.id, token.userId));
  return user ? { user, session: { activeOrganizationId: token.organizationId } } : null;
}
