import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import { FooterLink } from "~/components/panels";
import { callAuth } from "~/features/auth/call.server";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { resetSchema } from "~/features/auth/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { authMessage } from "~/features/auth/auth-messages";
import { resetLinkIsLive } from "~/features/auth/accounts.server";
import type { Route } from "./+types/reset-password";

export const meta: Route.MetaFunction = () => [{ title: "Choose a new password · Isotrope" }];

const badLink = "This reset link has expired or was already used. Ask for a new one.";

// The link is checked before the form is shown, so a forged or spent one is refused at once.
export async function loader({ request }: Route.LoaderArgs) {
  const params = new URL(request.url).searchParams;
  const token = params.get("token");
  if (params.get("error") || !token || !(await resetLinkIsLive(token))) return data({ token: null, problem: badLink }, { status: 400 });
  return { token, problem: null };
}

export async function action({ request }: Route.ActionArgs) {
  const submission = await parseForm(request, resetSchema);
  if (submission.status !== "success") return data(submission.reply({ hideFields: ["password", "confirm"] }), { status: 400 });
  const result = await callAuth(request, "/reset-password", { newPassword: submission.value.password, token: submission.value.token });
  if (!result.ok) {
    const reply = submission.reply({ formErrors: [authMessage(result, badLink)], hideFields: ["password", "confirm"] });
    return data(reply, { status: result.status === 429 ? 429 : 400 });
  }
  return redirectWithFlash("/sign-in", { kind: "success", message: "Your password is changed. Sign in with the new one." });
}

export default function ResetPassword({ loaderData, actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resetSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  if (loaderData.problem) {
    return (
      <>
        <h1 className="mb-2 text-xl font-semibold">Link not accepted</h1>
        <p role="alert" className="text-sm text-graphite-600">
          {loaderData.problem}
        </p>
        <FooterLink to="/forgot-password">Send a new link</FooterLink>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-6 text-xl font-semibold">Choose a new password</h1>
      <Form method="post" {...getFormProps(form)} className="space-y-2">
        <FormErrors errors={form.errors} />
        <input type="hidden" name="token" value={loaderData.token ?? ""} />
        <Field label="New password" autoComplete="new-password" hint="At least 10 characters, letters mixed with digits or symbols." {...inputProps(fields.password, "password")} />
        <Field label="Repeat the new password" autoComplete="new-password" {...inputProps(fields.confirm, "password")} />
        <Button className="w-full">Save the new password</Button>
      </Form>
    </>
  );
}
