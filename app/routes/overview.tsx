import { ButtonLink } from "~/components/button";
import { RfCautions } from "~/components/cautions";
import { Card, PageHeader } from "~/components/panels";
import { TitleBlock } from "~/components/title-block";
import { requireMember } from "~/features/auth/guard.server";
import { AttentionCard } from "~/features/overview/attention-card";
import { attentionFor } from "~/features/overview/attention.server";
import { overviewCounts } from "~/features/overview/counts.server";
import { guideFor } from "~/features/overview/guide";
import { roleLabels, staffRoles } from "~/lib/roles";
import { PORTAL_HOME } from "~/lib/portal-nav";
import { redirect } from "react-router";
import type { Route } from "./+types/overview";

export const meta: Route.MetaFunction = () => [{ title: "Overview · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const member = await requireMember(args);
  // A landlord's home is the client portal.
  if (member.role === "client") throw redirect(PORTAL_HOME);
  const staff = (staffRoles as readonly string[]).includes(member.role);
  const [{ team, inventory }, attention] = await Promise.all([
    overviewCounts(member.role, member.organizationId, staff),
    attentionFor(member.role, { organizationId: member.organizationId, userId: member.user.id }),
  ]);
  return { name: member.user.name, role: member.role, organizationName: member.organizationName, team, inventory, attention };
}

const teamLine = ({ members, pending }: { members: number; pending: number }) =>
  `${members} ${members === 1 ? "member" : "members"}${pending ? ` · ${pending} invited` : ""}`;

export default function Overview({ loaderData }: Route.ComponentProps) {
  const { name, role, organizationName, team, inventory, attention } = loaderData;
  const guide = guideFor(role, team, inventory);
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
        {attention ? <AttentionCard attention={attention} /> : null}
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
