import { requireApiMember } from "~/features/auth/guard.server";
import type { Route } from "./+types/me";

export async function loader(args: Route.LoaderArgs) {
  const member = await requireApiMember(args);
  return Response.json({
    email: member.user.email,
    name: member.user.name,
    role: member.role,
    organization: { id: member.organizationId, name: member.organizationName },
  });
}
