// Who may see which sites and clients. Staff see their organisation's; a `client` member
// only the client it is bound to (nothing when unbound). Every site and client query
// goes through these conditions.
import { and, eq, sql, type SQL } from "drizzle-orm";
import { schema } from "~/infra/db.server";
import type { Role } from "~/lib/roles";

export type Scope = { organizationId: string; role: Role; clientId: string | null };

function clientCondition(scope: Scope, column: typeof schema.site.clientId | typeof schema.client.id): SQL | undefined {
  if (scope.role !== "client") return undefined;
  return scope.clientId ? eq(column, scope.clientId) : sql`false`;
}

export function siteScope(scope: Scope): SQL {
  return and(eq(schema.site.organizationId, scope.organizationId), clientCondition(scope, schema.site.clientId))!;
}

export function clientScope(scope: Scope): SQL {
  return and(eq(schema.client.organizationId, scope.organizationId), clientCondition(scope, schema.client.id))!;
}

/** The scope a signed-in member works in. */
export function scopeOf(member: { organizationId: string; role: Role; clientId: string | null }): Scope {
  return { organizationId: member.organizationId, role: member.role, clientId: member.clientId };
}

/** The scope plus who acts: what every inventory command takes. */
export function actorOf(member: { organizationId: string; role: Role; clientId: string | null; user: { id: string } }) {
  return { ...scopeOf(member), userId: member.user.id };
}
