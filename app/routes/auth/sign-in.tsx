import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect, useNavigation, useSearchParams } from "react-router";
import { callAuth, cookiesOf } from "~/features/auth/call.server";
import { authMessage } from "~/features/auth/auth-messages";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { safeRedirect, signInSchema } from "~/features/auth/schemas";
import { getSignedIn } from "~/features/auth/guard.server";
import type { Route } from "./+types/sign-in";

export const meta: Route.MetaFunction = () => [{ title: "Sign in · Isotrope" }];

export async function loader({ request }: Route.LoaderArgs) {
  if (await getSignedIn(request)) throw redirect("/");
  return null;
}

export async function action({ request }: Route.ActionArgs) {
  const submission = await parseForm(request, signInSchema);
  if (submission.status !== "success") return data(submission.reply({ hideFields: ["password"] }), { status: 400 });
  const { email, password, redirectTo } = submission.value;
  const result = await callAuth(request, "/sign-in/email", { email, password, callbackURL: "/verified" });
  if (result.ok) return redirect(safeRedirect(redirectTo), { headers: cookiesOf(result) });
  const message = authMessage(result, "That e-mail and password do not match an account.");
  return data(submission.reply({ formErrors: [message], hideFields: ["password"] }), { status: result.status === 429 ? 429 : 400 });
}

export default function SignIn({ actionData }: Route.ComponentProps) {
  const [params] = useSearchParams();
  const navigation = useNavigation();
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signInSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Sign in</h1>
      <p className="mb-6 text-sm text-graphite-600">Welcome back. Use the e-mail your organisation knows you by.</p>
      <Form method="post" {...getFormProps(form)} className="space-y-2">
        <FormErrors errors={form.errors} />
        <input type="hidden" name="redirectTo" value={params.get("redirectTo") ?? ""} />
        <Field label="E-mail" autoComplete="email" {...inputProps(fields.email, "email")} />
        <Field label="Password" autoComplete="current-password" {...inputProps(fields.password, "password")} />
        <Button className="w-full" disabled={navigation.state === "submitting"}>
          {navigation.state === "submitting" ? "Signing in…" : "Sign in"}
        </Button>
      </Form>
      <div className="mt-6 flex justify-between text-sm">
        <Link to="/forgot-password" className="link">
          Forgot your password?
        </Link>
        <Link to="/sign-up" className="link">
          Create an account
        </Link>
      </div>
    </>
  );
}
