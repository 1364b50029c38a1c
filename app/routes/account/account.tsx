import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import { callAuth, cookiesOf, TOO_MANY_ATTEMPTS } from "~/features/auth/call.server";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { inputProps } from "~/lib/conform";
import { changePasswordSchema } from "~/features/auth/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { requireMember } from "~/features/auth/guard.server";
import { roleLabels } from "~/lib/roles";
import type { Route } from "./+types/account";

export const meta: Route.MetaFunction = () => [{ title: "Account · Isotrope" }];

export async function loader({ request }: Route.LoaderArgs) {
  const me = await requireMember(request);
  return { name: me.user.name, email: me.user.email, role: me.role, organizationName: me.organizationName };
}

export async function action({ request }: Route.ActionArgs) {
  await requireMember(request);
  const submission = parseWithZod(await request.formData(), { schema: changePasswordSchema });
  const hide = { hideFields: ["current", "password", "confirm"] };
  if (submission.status !== "success") return data(submission.reply(hide), { status: 400 });
  const result = await callAuth(request, "/change-password", {
    currentPassword: submission.value.current,
    newPassword: submission.value.password,
    revokeOtherSessions: true,
  });
  if (!result.ok) {
    const reply =
      result.status === 429
        ? submission.reply({ ...hide, formErrors: [TOO_MANY_ATTEMPTS] })
        : submission.reply({ ...hide, fieldErrors: { current: ["Your current password is not right."] } });
    return data(reply, { status: result.status === 429 ? 429 : 400 });
  }
  return redirectWithFlash("/account", { kind: "success", message: "Password changed. Other devices are signed out." }, { headers: cookiesOf(result) });
}

export default function Account({ loaderData, actionData }: Route.ComponentProps) {
  const { name, email, role, organizationName } = loaderData;
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: changePasswordSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const details = [
    ["Name", name],
    ["E-mail", email],
    ["Organisation", organizationName],
    ["Role", roleLabels[role]],
  ] as const;
  return (
    <>
      <PageHeader title="Account">Your own details. Your organisation's owner sets roles.</PageHeader>
      <div className="grid gap-6 md:grid-cols-2">
        <Card title="You">
          <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[8rem_minmax(0,1fr)] sm:gap-y-3">
            {details.map(([label, value]) => (
              <div key={label} className="contents">
                <dt className="label-caps sm:pt-1">{label}</dt>
                <dd className="mb-2 [overflow-wrap:anywhere] sm:mb-0">{value}</dd>
              </div>
            ))}
          </dl>
        </Card>
        <Card title="Change password">
          <Form method="post" {...getFormProps(form)} className="space-y-2">
            <FormErrors errors={form.errors} />
            <Field label="Current password" autoComplete="current-password" {...inputProps(fields.current, "password")} />
            <Field label="New password" autoComplete="new-password" hint="At least 10 characters, letters mixed with digits or symbols." {...inputProps(fields.password, "password")} />
            <Field label="Repeat the new password" autoComplete="new-password" {...inputProps(fields.confirm, "password")} />
            <Button>Change password</Button>
          </Form>
        </Card>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
