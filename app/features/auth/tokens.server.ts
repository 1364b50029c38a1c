// API tokens: a member's bearer credential for /api/v1. The token is shown once at creation;
// only its SHA-256 is stored, so a database read never reveals a usable token.
import { createHash, randomBytes } from "node:crypto";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { audit, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";
import { isRole, type Role } from "~/lib/roles";

const { apiToken } = schema;
const PREFIX = "iso_";

const hashOf = (token: string) => createHash("sha256").update(token).digest("hex");

export async function createToken(actor: Actor & { memberId: string }, name: string) {
  const token = `${PREFIX}${randomBytes(32).toString("base64url")}`;
  const row = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(apiToken)
      .values({ organizationId: actor.organizationId, memberId: actor.memberId, userId: actor.userId, name, tokenHash: hashOf(token), prefix: token.slice(0, PREFIX.length + 6) })
      .returning({ id: apiToken.id, name: apiToken.name, prefix: apiToken.prefix, createdAt: apiToken.createdAt });
    await audit(tx, actor, "token.created", "token", row.id, { name });
    return row;
  });
  return { ...row, token };
}

export function listTokens(memberId: string) {
  return db
    .select({ id: apiToken.id, name: apiToken.name, prefix: apiToken.prefix, createdAt: apiToken.createdAt, lastUsedAt: apiToken.lastUsedAt })
    .from(apiToken)
    .where(eq(apiToken.memberId, memberId))
    .orderBy(desc(apiToken.createdAt));
}

/** Revokes one of the member's own tokens (another member's token is not found). */
export async function revokeToken(actor: Actor & { memberId: string }, tokenId: string) {
  await db.transaction(async (tx) => {
    const gone = await tx.delete(apiToken).where(and(eq(apiToken.id, tokenId), eq(apiToken.memberId, actor.memberId))).returning({ id: apiToken.id, name: apiToken.name });
    if (!gone.length) throw new DomainError("No such token.", 404);
    await audit(tx, actor, "token.revoked", "token", tokenId, { name: gone[0].name });
  });
}

const TOUCH_EVERY_MS = 60_000;

/**
 * What a bearer token stands for, in one prepared query: the token, its user, and the user's
 * memberships (oldest first, as findMembership orders them), or null for no such token. Notes when
 * the token was last used (to the minute).
 */
const tokenWithMemberships = db
  .select({
    id: apiToken.id,
    organizationId: apiToken.organizationId,
    lastUsedAt: apiToken.lastUsedAt,
    user: schema.user,
    memberId: schema.member.id,
    role: schema.member.role,
    memberOrganizationId: schema.organization.id,
    organizationName: schema.organization.name,
    clientId: schema.clientMember.clientId,
  })
  .from(apiToken)
  .innerJoin(schema.user, eq(schema.user.id, apiToken.userId))
  .leftJoin(schema.member, eq(schema.member.userId, schema.user.id))
  .leftJoin(schema.organization, eq(schema.organization.id, schema.member.organizationId))
  .leftJoin(schema.clientMember, eq(schema.clientMember.memberId, schema.member.id))
  .where(eq(apiToken.tokenHash, sql.placeholder("tokenHash")))
  .orderBy(asc(schema.member.createdAt))
  .prepare("token_with_memberships");

export async function resolveToken(authorization: string) {
  const match = authorization.match(/^Bearer\s+(\S{1,200})$/i);
  if (!match || !match[1].startsWith(PREFIX)) return null;
  const rows = await tokenWithMemberships.execute({ tokenHash: hashOf(match[1]) });
  const first = rows[0];
  if (!first) return null;
  if (!first.lastUsedAt || Date.now() - first.lastUsedAt.getTime() > TOUCH_EVERY_MS) {
    await db.update(apiToken).set({ lastUsedAt: new Date() }).where(eq(apiToken.id, first.id));
  }
  // The same choice as findMembership: the token's organisation, else the oldest membership.
  const memberships = rows.filter((r) => r.memberOrganizationId !== null);
  const row = memberships.find((r) => r.memberOrganizationId === first.organizationId) ?? memberships[0];
  const membership =
    row && isRole(row.role)
      ? { memberId: row.memberId!, role: row.role as Role, organizationId: row.memberOrganizationId!, organizationName: row.organizationName!, clientId: row.clientId }
      : null;
  return { id: first.id, userId: first.user.id, organizationId: first.organizationId, user: first.user, membership };
}
