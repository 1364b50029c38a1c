// A signed-in page's session, user and membership in one query, read the way better-auth's
// get-session reads them in the common case (decision record 0009): a session cookie with a
// valid HMAC-SHA-256 signature, a session that has not expired and is not yet due for its
// sliding refresh. Wherever better-auth's answer could differ or it would write something
// (a bad or missing signature, no such session, an expired one, one due for refresh, "don't
// remember me", a leftover session-data cookie) this returns undefined and the caller asks
// better-auth itself. A request without any of its cookies is simply signed out.
import { createHmac, timingSafeEqual } from "node:crypto";
import { asc, eq, sql } from "drizzle-orm";
import { auth } from "~/features/auth/auth.server";
import { db, schema } from "~/infra/db.server";
import { isRole, type Role } from "~/lib/roles";
import type { Membership, SignedIn } from "./session-context.server";

export type FastRead = { signedIn: SignedIn; membership: Membership | null };

/** One cookie's value from a Cookie header, URL-decoded; null when absent or malformed. */
export function cookieValue(header: string | null, name: string): string | null {
  if (!header) return null;
  for (const part of header.split(";")) {
    const eq = part.indexOf("=");
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    let value = part.slice(eq + 1).trim();
    if (value.startsWith('"') && value.endsWith('"')) value = value.slice(1, -1);
    try {
      return decodeURIComponent(value);
    } catch {
      return null;
    }
  }
  return null;
}

/** The token of a `token.signature` cookie whose signature is the secret's HMAC-SHA-256 of the token, else null. */
export function verifiedToken(value: string, secret: string): string | null {
  const dot = value.lastIndexOf(".");
  if (dot < 1) return null;
  const token = value.slice(0, dot);
  const given = Buffer.from(value.slice(dot + 1));
  const expected = Buffer.from(createHmac("sha256", secret).update(token).digest("base64"));
  return given.length === expected.length && timingSafeEqual(given, expected) ? token : null;
}

/** Built once, prepared by PostgreSQL once per connection: the hot path of every signed-in page. */
const sessionByToken = db
  .select({
    session: schema.session,
    user: schema.user,
    memberId: schema.member.id,
    role: schema.member.role,
    organizationId: schema.organization.id,
    organizationName: schema.organization.name,
    clientId: schema.clientMember.clientId,
  })
  .from(schema.session)
  .innerJoin(schema.user, eq(schema.user.id, schema.session.userId))
  .leftJoin(schema.member, eq(schema.member.userId, schema.user.id))
  .leftJoin(schema.organization, eq(schema.organization.id, schema.member.organizationId))
  .leftJoin(schema.clientMember, eq(schema.clientMember.memberId, schema.member.id))
  .where(eq(schema.session.token, sql.placeholder("token")))
  .orderBy(asc(schema.member.createdAt))
  .prepare("session_by_token");

export async function readSessionFast(headers: Headers): Promise<FastRead | undefined> {
  const context = await auth.$context;
  const cookies = headers.get("cookie");
  const names = context.authCookies;
  const sessionCookie = cookieValue(cookies, names.sessionToken.name);
  const dataCookie = cookieValue(cookies, names.sessionData.name);
  const dontRemember = cookieValue(cookies, names.dontRememberToken.name);
  if (!sessionCookie) return dataCookie || dontRemember ? undefined : { signedIn: null, membership: null };
  if (dataCookie || dontRemember) return undefined;
  const token = verifiedToken(sessionCookie, context.secret);
  if (!token) return undefined;

  const rows = await sessionByToken.execute({ token });
  const first = rows[0];
  if (!first) return undefined;
  const { session, user } = first;
  const now = Date.now();
  const { expiresIn, updateAge } = context.sessionConfig;
  if (session.expiresAt.getTime() < now) return undefined;
  if (session.expiresAt.getTime() - expiresIn * 1000 + updateAge * 1000 <= now) return undefined;

  const memberships = rows.filter((r) => r.memberId && r.organizationId);
  const row = memberships.find((r) => r.organizationId === session.activeOrganizationId) ?? memberships[0];
  const membership =
    row && row.role && isRole(row.role)
      ? { memberId: row.memberId!, role: row.role as Role, organizationId: row.organizationId!, organizationName: row.organizationName!, clientId: row.clientId }
      : null;
  return { signedIn: { session, user } as NonNullable<SignedIn>, membership };
}
