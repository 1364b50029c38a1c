import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/form.server";
import { data, Form } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { FooterLink } from "~/components/panels";
import { authMessage } from "~/features/auth/auth-messages";
import { callAuth } from "~/features/auth/call.server";
import { pendingAddress } from "~/features/auth/pending-address.server";
import { resendSchema } from "~/features/auth/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { inputProps } from "~/lib/conform";
import type { Route } from "./+types/check-email";

export const meta: Route.MetaFunction = () => [{ title: "Check your e-mail · Isotrope" }];

// The address comes from the signed cookie sign-up set, never from the address bar.
export async function loader({ request }: Route.LoaderArgs) {
  return { email: await pendingAddress(request) };
}

// Resend: the same answer for any address (confirmed, unknown or waiting), throttled per address.
export async function action({ request }: Route.ActionArgs) {
  const submission = await parseForm(request, resendSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const email = (await pendingAddress(request)) ?? submission.value.email;
  if (!email) return data(submission.reply({ fieldErrors: { email: ["Enter the address you signed up with."] } }), { status: 400 });
  const result = await callAuth(request, "/send-verification-email", { email, callbackURL: "/verified" });
  if (result.status === 429) return data(submission.reply({ formErrors: [authMessage(result)] }), { status: 429 });
  return redirectWithFlash("/check-email", {
    kind: "info",
    message: "If that address is waiting for confirmation, a new link is on its way. It works for one hour.",
  });
}

export default function CheckEmail({ loaderData, actionData }: Route.ComponentProps) {
  const { email } = loaderData;
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resendSchema }),
    shouldValidate: "onBlur",
  });
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold">Check your e-mail</h1>
      <p className="text-sm text-graphite-600">
        We sent a confirmation link to {email ? <strong className="text-ink-900">{email}</strong> : "the address you signed up with"}. Follow it
        within the hour to finish signing up.
      </p>
      <Form method="post" {...getFormProps(form)} className="mt-6 space-y-3">
        <FormErrors errors={form.errors} />
        {email ? null : <Field label="E-mail" autoComplete="email" {...inputProps(fields.email, "email")} />}
        <Button tone="secondary" className="w-full">
          Send the link again
        </Button>
      </Form>
      <FooterLink to="/sign-in">Back to sign-in</FooterLink>
    </>
  );
}
