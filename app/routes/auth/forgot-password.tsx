import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form } from "react-router";
import { FooterLink } from "~/components/panels";
import { callAuth } from "~/features/auth/call.server";
import { authMessage } from "~/features/auth/auth-messages";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { forgotSchema } from "~/features/auth/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import type { Route } from "./+types/forgot-password";

export const meta: Route.MetaFunction = () => [{ title: "Reset your password · Isotrope" }];

export async function action({ request }: Route.ActionArgs) {
  const submission = await parseForm(request, forgotSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const result = await callAuth(request, "/request-password-reset", { email: submission.value.email, redirectTo: "/reset-password" });
  if (result.status === 429) return data(submission.reply({ formErrors: [authMessage(result)] }), { status: 429 });
  // The same answer, in the same time (the mail goes out afterwards), whether or not the address has an account.
  return redirectWithFlash("/sign-in", { kind: "info", message: "If that address has an account, a reset link is on its way. It works once, for one hour." });
}

export default function ForgotPassword({ actionData }: Route.ComponentProps) {
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: forgotSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Reset your password</h1>
      <p className="mb-6 text-sm text-graphite-600">We'll e-mail you a link to choose a new one.</p>
      <Form method="post" {...getFormProps(form)} className="space-y-2">
        <FormErrors errors={form.errors} />
        <Field label="E-mail" autoComplete="email" {...inputProps(fields.email, "email")} />
        <Button className="w-full">Send the link</Button>
      </Form>
      <FooterLink to="/sign-in">Back to sign-in</FooterLink>
    </>
  );
}
