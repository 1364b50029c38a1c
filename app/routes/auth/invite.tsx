import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { data, Form, Link, redirect } from "react-router";
import { callAuth, cookiesOf } from "~/features/auth/call.server";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { parseForm } from "~/lib/form.server";
import { acceptSchema } from "~/features/auth/schemas";
import { redirectWithFlash } from "~/infra/flash.server";
import { acceptAsNewUser, acceptAsUser, findInvitation } from "~/features/members/invitations.server";
import { DomainError } from "~/lib/domain-error";
import { getSignedIn } from "~/features/auth/guard.server";
import { nextStepAfter } from "~/features/members/invitation-status";
import { membershipsOf } from "~/features/members/organizations.server";
import { FooterLink } from "~/components/panels";
import { isRole, roleLabels } from "~/lib/roles";
import type { Route } from "./+types/invite";

export const meta: Route.MetaFunction = () => [{ title: "Invitation · Isotrope" }];

async function load(request: Request, invitationId: string) {
  const invitation = await findInvitation(invitationId);
  if (!invitation) throw data({ message: "There is no such invitation. Check the link in your e-mail." }, { status: 404 });
  return { invitation, signedIn: await getSignedIn(request) };
}

/** A form-level error in Conform's reply shape. */
const refusal = (message: string, status: number) => data({ status: "error" as const, error: { "": [message] } }, { status });

export async function loader({ request, params }: Route.LoaderArgs) {
  const { invitation, signedIn } = await load(request, params.invitationId);
  const mine = signedIn?.user.email === invitation.email ? await membershipsOf(signedIn.user.id) : [];
  const view = {
    id: invitation.id,
    email: invitation.email,
    organizationName: invitation.organizationName,
    roleLabel: isRole(invitation.role) ? roleLabels[invitation.role] : invitation.role,
    problem: invitation.problem,
    hasAccount: invitation.hasAccount,
    signedInEmail: signedIn?.user.email ?? null,
    next: nextStepAfter(Boolean(signedIn)),
    // Where the person already works: joining keeps those memberships (acceptAsUser).
    otherOrganizations: mine.filter((m) => m.organizationId !== invitation.organizationId).map((m) => m.organizationName),
  };
  return data(view, { status: invitation.problem ? 410 : 200 });
}

export async function action({ request, params }: Route.ActionArgs) {
  const { invitation, signedIn } = await load(request, params.invitationId);
  if (invitation.problem) return refusal(invitation.problem, 410);
  try {
    if (signedIn) {
      if (signedIn.user.email !== invitation.email) throw new DomainError("This invitation is for another e-mail address.", 403);
      await acceptAsUser(invitation.id, signedIn.user.id, signedIn.user.email);
      return redirectWithFlash("/", { kind: "success", message: `Welcome to ${invitation.organizationName}.` });
    }
    const submission = await parseForm(request, acceptSchema);
    if (submission.status !== "success") return data(submission.reply({ hideFields: ["password", "confirm"] }), { status: 400 });
    await acceptAsNewUser(invitation.id, invitation.email, submission.value.name, submission.value.password);
    const result = await callAuth(request, "/sign-in/email", { email: invitation.email, password: submission.value.password });
    if (!result.ok) return redirectWithFlash("/sign-in", { kind: "success", message: "Your account is ready. Sign in to continue." });
    return redirect("/", { headers: cookiesOf(result) });
  } catch (error) {
    if (error instanceof DomainError) return refusal(error.message, error.status);
    throw error;
  }
}

const listNames = (names: string[]) => (names.length < 2 ? names.join("") : `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`);

export default function Invite({ loaderData, actionData }: Route.ComponentProps) {
  const v = loaderData;
  const [form, fields] = useForm({
    lastResult: actionData,
    onValidate: ({ formData }) => parseWithZod(formData, { schema: acceptSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
  });
  const heading = <h1 className="mb-2 text-xl font-semibold">Join {v.organizationName}</h1>;
  if (v.problem) {
    return (
      <>
        {heading}
        <p role="alert" className="text-sm text-graphite-600">
          {v.problem}
        </p>
        <FooterLink to={v.next.to}>{v.next.label}</FooterLink>
      </>
    );
  }
  const intro = (
    <p className="mb-6 text-sm text-graphite-600">
      You are invited as <strong className="text-ink-900">{v.roleLabel}</strong>, for <strong className="text-ink-900">{v.email}</strong>.
    </p>
  );
  if (v.signedInEmail) {
    return (
      <>
        {heading}
        {intro}
        {v.signedInEmail === v.email ? (
          <Form method="post" className="space-y-2">
            {v.otherOrganizations.length ? (
              <p className="text-sm text-graphite-600">
                You are a member of {listNames(v.otherOrganizations)}. Joining adds {v.organizationName}: you stay a member of{" "}
                {v.otherOrganizations.length > 1 ? "them" : "it"}, and Isotrope opens {v.organizationName} from now on. You can switch
                back on your Account page.
              </p>
            ) : null}
            <FormErrors errors={form.errors} />
            <Button className="w-full">Join the organisation</Button>
          </Form>
        ) : (
          <p role="alert" className="text-sm text-danger-700">
            You are signed in as {v.signedInEmail}. Sign out, then open the link again.
          </p>
        )}
      </>
    );
  }
  if (v.hasAccount) {
    return (
      <>
        {heading}
        {intro}
        <Link to={`/sign-in?redirectTo=${encodeURIComponent(`/invite/${v.id}`)}`} className="link">
          Sign in to accept
        </Link>
      </>
    );
  }
  return (
    <>
      {heading}
      {intro}
      <Form method="post" {...getFormProps(form)} className="space-y-2">
        <FormErrors errors={form.errors} />
        <Field label="Your name" autoComplete="name" {...inputProps(fields.name, "text")} />
        <Field label="Password" autoComplete="new-password" hint="At least 10 characters, letters mixed with digits or symbols." {...inputProps(fields.password, "password")} />
        <Field label="Repeat the password" autoComplete="new-password" {...inputProps(fields.confirm, "password")} />
        <Button className="w-full">Create my account and join</Button>
      </Form>
    </>
  );
}
