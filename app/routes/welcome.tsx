import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { organizationSchema } from "~/features/members/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { invitationsFor } from "~/features/members/invitations.server";
import { invitationRoleLabel } from "~/features/members/invitation-list";
import { createOrganization } from "~/features/members/organizations.server";
import { domainErrorReply } from "~/lib/domain-error";
import { getMembership, requireUser } from "~/features/auth/guard.server";
import type { Route } from "./+types/welcome";

export const meta: Route.MetaFunction = () => [{ title: "Set up your organisation · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const { user } = await requireUser(args);
  if (await getMembership(args)) throw redirect("/");
  return { invitations: await invitationsFor(user.email) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const { user } = await requireUser({ request, context });
  const submission = await parseForm(request, organizationSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    await createOrganization(user.id, submission.value.name);
  } catch (error) {
    return domainErrorReply(error, submission);
  }
  return redirectWithFlash("/", { kind: "success", message: `${submission.value.name} is set up. Invite your colleagues from Members.` });
}

export default function Welcome({ loaderData, actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: organizationSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <div className="max-w-xl">
      <PageHeader title="Set up your organisation">You are signed in but belong to no organisation yet.</PageHeader>
      {loaderData.invitations.length ? (
        <Card title="Invitations waiting for you">
          <ul className="space-y-2 text-sm">
            {loaderData.invitations.map((i) => (
              <li key={i.id}>
                <Link className="link" to={`/invite/${i.id}`}>
                  Join {i.organizationName} as {invitationRoleLabel(i.role)}
                </Link>
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
      <div className="mt-5">
        <Card title="Start a new consultancy">
          <Form method="post" {...getFormProps(form)} className="space-y-2">
            <FormErrors errors={form.errors} />
            <Field label="Consultancy name" {...inputProps(fields.name, "text")} />
            <Button>Create the organisation</Button>
          </Form>
        </Card>
      </div>
    </div>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
