import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect, useNavigation } from "react-router";
import { callAuth } from "~/features/auth/call.server";
import { authMessage } from "~/features/auth/auth-messages";
import { rememberPendingAddress } from "~/features/auth/pending-address.server";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { signUpSchema } from "~/features/auth/schemas";
import { getSignedIn } from "~/features/auth/guard.server";
import type { Route } from "./+types/sign-up";

export const meta: Route.MetaFunction = () => [{ title: "Create an account · Isotrope" }];

export async function loader({ request }: Route.LoaderArgs) {
  if (await getSignedIn(request)) throw redirect("/");
  return null;
}

// A taken address gets exactly the answer a new one gets (better-auth answers alike when
// e-mail confirmation is required); its owner is told by mail (auth.server.ts).
export async function action({ request }: Route.ActionArgs) {
  const submission = await parseForm(request, signUpSchema);
  const hide = { hideFields: ["password", "confirm"] };
  if (submission.status !== "success") return data(submission.reply(hide), { status: 400 });
  const { name, email, password } = submission.value;
  const result = await callAuth(request, "/sign-up/email", { name, email, password, callbackURL: "/verified" });
  if (result.ok) return redirect("/check-email", { headers: await rememberPendingAddress(email) });
  const message = authMessage(result, "The account could not be created. Check the name and address, then try again.");
  return data(submission.reply({ ...hide, formErrors: [message] }), { status: result.status === 429 ? 429 : 400 });
}

export default function SignUp({ actionData }: Route.ComponentProps) {
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signUpSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Create an account</h1>
      <p className="mb-6 text-sm text-graphite-600">
        For consultancies setting up Isotrope. Joining a colleague's organisation? Use the link in their invitation instead.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-2">
        <FormErrors errors={form.errors} />
        <Field label="Your name" autoComplete="name" {...inputProps(fields.name, "text")} />
        <Field label="E-mail" autoComplete="email" {...inputProps(fields.email, "email")} />
        <Field label="Password" autoComplete="new-password" hint="At least 10 characters, letters mixed with digits or symbols." {...inputProps(fields.password, "password")} />
        <Field label="Repeat the password" autoComplete="new-password" {...inputProps(fields.confirm, "password")} />
        <Button className="w-full" disabled={navigation.state === "submitting"}>
          Create account
        </Button>
      </Form>
      <p className="mt-6 text-sm">
        Have an account?{" "}
        <Link to="/sign-in" className="link">
          Sign in
        </Link>
      </p>
    </>
  );
}
