import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import { callAuth, cookiesOf } from "~/features/auth/call.server";
import { authMessage } from "~/features/auth/auth-messages";
import { membershipsOf, switchOrganization } from "~/features/members/organizations.server";
import { DomainError, domainErrorReply } from "~/lib/domain-error";
import { TokenPanel } from "~/features/auth/token-panel";
import { tokenCreateSchema } from "~/features/auth/token-schemas";
import { createToken, listTokens, revokeToken } from "~/features/auth/tokens.server";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { inputProps } from "~/lib/conform";
import { parseForm, readFormData } from "~/lib/form.server";
import { changePasswordSchema, switchOrganizationSchema } from "~/features/auth/schemas";
import { redirectWithFlash, withFlash } from "~/infra/flash.server";
import { requireMember } from "~/features/auth/guard.server";
import { isRole, roleLabels } from "~/lib/roles";
import type { Route } from "./+types/account";

export const meta: Route.MetaFunction = () => [{ title: "Account · Isotrope" }];

export async function loader(args: Route.LoaderArgs) {
  const me = await requireMember(args);
  const others = (await membershipsOf(me.user.id)).filter((m) => m.organizationId !== me.organizationId);
  const tokens = await listTokens(me.memberId);
  return { name: me.user.name, email: me.user.email, role: me.role, organizationName: me.organizationName, others, tokens };
}

export async function action({ request, context }: Route.ActionArgs) {
  const me = await requireMember({ request, context });
  const formData = await readFormData(request);
  const intent = formData.get("intent");
  if (intent === "create-token" || intent === "revoke-token") {
    const who = { organizationId: me.organizationId, userId: me.user.id, memberId: me.memberId };
    try {
      if (intent === "revoke-token") {
        await revokeToken(who, String(formData.get("tokenId") ?? ""));
        return { revoked: true };
      }
      const parsed = tokenCreateSchema.safeParse({ name: formData.get("name") ?? "" });
      if (!parsed.success) return data({ tokenError: parsed.error.issues[0].message }, { status: 400 });
      const made = await createToken(who, parsed.data.name);
      return { token: { value: made.token, name: made.name } };
    } catch (error) {
      if (error instanceof DomainError) return data({ tokenError: error.message }, { status: error.status });
      throw error;
    }
  }
  if (intent === "switch-organization") {
    const submission = await parseForm(formData, switchOrganizationSchema);
    if (submission.status !== "success") return data(submission.reply(), { status: 400 });
    try {
      const name = await switchOrganization(me.user.id, submission.value.organizationId);
      return redirectWithFlash("/", { kind: "success", message: `You are now working in ${name}.` });
    } catch (error) {
      return domainErrorReply(error, submission);
    }
  }
  const submission = await parseForm(formData, changePasswordSchema);
  const hide = { hideFields: ["current", "password", "confirm"] };
  if (submission.status !== "success") return data(submission.reply(hide), { status: 400 });
  const result = await callAuth(request, "/change-password", {
    currentPassword: submission.value.current,
    newPassword: submission.value.password,
    revokeOtherSessions: true,
  });
  if (!result.ok) {
    const message = authMessage(result);
    const reply =
      result.code === "INVALID_PASSWORD"
        ? submission.reply({ ...hide, fieldErrors: { current: [message] } })
        : submission.reply({ ...hide, formErrors: [message] });
    return data(reply, { status: result.status === 429 ? 429 : 400 });
  }
  // Answer in place with an emptied form (a redirect to the same page would keep the typed passwords).
  const headers = await withFlash({ kind: "success", message: "Password changed. Other devices are signed out." }, cookiesOf(result));
  return data(submission.reply({ resetForm: true }), { headers });
}

export default function Account({ loaderData, actionData }: Route.ComponentProps) {
  const { name, email, role, organizationName, others, tokens } = loaderData;
  const [form, fields] = useForm({
    // Token posts go through fetchers; the route's own action data is the password form's reply.
    lastResult: actionData && !("token" in actionData || "revoked" in actionData || "tokenError" in actionData) ? actionData : undefined,
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
            <input type="hidden" name="intent" value="change-password" />
            <FormErrors errors={form.errors} />
            <Field label="Current password" autoComplete="current-password" {...inputProps(fields.current, "password")} />
            <Field label="New password" autoComplete="new-password" hint="At least 10 characters, letters mixed with digits or symbols." {...inputProps(fields.password, "password")} />
            <Field label="Repeat the new password" autoComplete="new-password" {...inputProps(fields.confirm, "password")} />
            <Button>Change password</Button>
          </Form>
        </Card>
        <Card title="API tokens">
          <TokenPanel tokens={tokens} />
        </Card>
        {others.length ? (
          <Card title="Your other organisations">
            <p className="mb-3 text-sm text-graphite-600">Isotrope opens one organisation at a time; switching also sets where you start next time.</p>
            <ul className="divide-y divide-rule text-sm">
              {others.map((o) => (
                <li key={o.organizationId} className="flex items-center justify-between gap-3 py-2">
                  <span className="min-w-0 break-words">
                    {o.organizationName} <span className="text-graphite-600">· {isRole(o.role) ? roleLabels[o.role] : o.role}</span>
                  </span>
                  <Form method="post">
                    <input type="hidden" name="intent" value="switch-organization" />
                    <input type="hidden" name="organizationId" value={o.organizationId} />
                    <Button tone="secondary" className="px-2.5 py-1" aria-label={`Work in ${o.organizationName}`}>
                      Work here
                    </Button>
                  </Form>
                </li>
              ))}
            </ul>
          </Card>
        ) : null}
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
