// API tokens: a member's bearer credential for /api/v1. The token is shown once at creation;
// only its SHA-256 is stored, so a database read never reveals a usable token.
import { createHash, randomBytes } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import { db, schema } from "~/infra/db.server";
import { audit, type Actor } from "~/lib/audit.server";
import { DomainError } from "~/lib/domain-error";

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

/** The user and organisation a bearer token stands for, or null. Notes when it was last used (to the minute). */
export async function resolveToken(authorization: string) {
  const match = authorization.match(/^Bearer\s+(\S{1,200})$/i);
  if (!match || !match[1].startsWith(PREFIX)) return null;
  const [row] = await db
    .select({ id: apiToken.id, userId: apiToken.userId, organizationId: apiToken.organizationId, lastUsedAt: apiToken.lastUsedAt })
    .from(apiToken)
    .where(eq(apiToken.tokenHash, hashOf(match[1])));
  if (!row) return null;
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > TOUCH_EVERY_MS) {
    await db.update(apiToken).set({ lastUsedAt: new Date() }).where(eq(apiToken.id, row.id));
  }
  return row;
}
