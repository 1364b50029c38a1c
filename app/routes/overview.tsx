import { ButtonLink } from "~/components/button";
import { RfCautions } from "~/components/cautions";
import { Card, PageHeader } from "~/components/panels";
import { TitleBlock } from "~/components/title-block";
import { requireMember } from "~/features/auth/guard.server";
import { teamCounts } from "~/features/members/members.server";
import { guideFor } from "~/features/overview/guide";
import { roleLabels } from "~/lib/roles";
import type { Route } from "./+types/overview";

export const meta: Route.MetaFunction = () => [{ title: "Overview · Isotrope" }];

export async function loader({ request }: Route.LoaderArgs) {
  const member = await requireMember(request);
  const team = member.role === "owner" ? await teamCounts(member.organizationId) : null;
  return { name: member.user.name, role: member.role, organizationName: member.organizationName, team };
}

const teamLine = ({ members, pending }: { members: number; pending: number }) =>
  `${members} ${members === 1 ? "member" : "members"}${pending ? ` · ${pending} invited` : ""}`;

export default function Overview({ loaderData }: Route.ComponentProps) {
  const { name, role, organizationName, team } = loaderData;
  const guide = guideFor(role, team);
  const cells = [
    { label: "Organisation", value: organizationName },
    { label: "Signed in as", value: name },
    { label: "Role", value: roleLabels[role] },
    ...(team ? [{ label: "Team", value: teamLine(team) }] : []),
  ];
  return (
    <>
      <PageHeader title="Overview" label={organizationName}>
        What your role can do in Isotrope today, and the next step.
      </PageHeader>
      <div className="space-y-6">
        <TitleBlock label="You and your organisation" cells={cells} />
        <div className="grid gap-6 md:grid-cols-2">
          <Card title="What you can do now">
            <ul className="list-disc space-y-2 pl-5 marker:text-graphite-500">
              {guide.now.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </Card>
          <Card title="Next">
            <p className="font-bold text-ink-900">{guide.next.title}</p>
            <p className="mt-1 text-graphite-600">{guide.next.text}</p>
            <ButtonLink to={guide.next.to} tone="primary" className="mt-4">
              {guide.next.action}
            </ButtonLink>
          </Card>
        </div>
        <RfCautions />
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
