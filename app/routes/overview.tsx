import { Card, PageHeader } from "~/components/panels";
import { RfCautions } from "~/components/cautions";
import { teamCounts } from "~/features/members/members.server";
import { requireMember } from "~/features/auth/guard.server";
import { roleLabels, roleSummaries } from "~/lib/roles";
import { ButtonLink } from "~/components/button";
import type { Route } from "./+types/overview";

export const meta: Route.MetaFunction = () => [{ title: "Overview · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const member = await requireMember(args);
  const team = member.role === "owner" ? await teamCounts(member.organizationId) : null;
  return { name: member.user.name, role: member.role, organizationName: member.organizationName, team };
}

export default function Home({ loaderData }: Route.ComponentProps) {
  const { name, role, organizationName, team } = loaderData;
  return (
    <>
      <PageHeader title={`Good to see you, ${name.split(" ")[0]}`}>{organizationName}</PageHeader>
      <div className="grid gap-5 md:grid-cols-2">
        <Card title="Your role">
          <p className="font-medium text-ink-900">{roleLabels[role]}</p>
          <p className="mt-1 text-sm text-ink-600">{roleSummaries[role]}</p>
        </Card>
        {team ? (
          <Card title="Team" actions={<ButtonLink to="/members">Manage members</ButtonLink>}>
            <p className="text-sm text-ink-800">
              <strong className="text-2xl">{team.members}</strong> {team.members === 1 ? "member" : "members"}
              {team.pending ? ` · ${team.pending} invitation${team.pending === 1 ? "" : "s"} waiting` : ""}
            </p>
          </Card>
        ) : null}
        <div className="md:col-span-2">
          <RfCautions />
        </div>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
