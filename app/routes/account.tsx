import { Card, PageHeader } from "~/components/panels";
import { requireMember } from "~/permissions.server";
import { roleLabels } from "~/roles";
import type { Route } from "./+types/account";

export const meta: Route.MetaFunction = () => [{ title: "Account · Isotrope" }];

export async function loader({ request }: Route.LoaderArgs) {
  const me = await requireMember(request);
  return { name: me.user.name, email: me.user.email, role: me.role, organizationName: me.organizationName };
}

export default function Account({ loaderData }: Route.ComponentProps) {
  const { name, email, role, organizationName } = loaderData;
  return (
    <>
      <PageHeader title="Account" />
      <Card>
        <dl className="grid grid-cols-[10rem_1fr] gap-y-2 text-sm">
          <dt className="text-ink-600">Name</dt>
          <dd>{name}</dd>
          <dt className="text-ink-600">E-mail</dt>
          <dd>{email}</dd>
          <dt className="text-ink-600">Organisation</dt>
          <dd>{organizationName}</dd>
          <dt className="text-ink-600">Role</dt>
          <dd>{roleLabels[role]}</dd>
        </dl>
        <p className="mt-4 text-sm text-ink-600">
          To change your password, sign out and use “Forgot your password?”. Your organisation's owner changes roles.
        </p>
      </Card>
    </>
  );
}
