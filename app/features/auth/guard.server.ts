// The one guard every loader and action starts with: who is signed in, in which
// organisation, with which role. Queries downstream scope by `member.organizationId`.
// Pass the loader's or action's arguments ({ request, context }) so that the layout and the page
// share one session lookup per request (session-context.server.ts); a bare Request works too.
import { data, redirect } from "react-router";
import { lookupOf, type GuardArgs, type Membership, type SignedIn } from "~/features/auth/session-context.server";
import { resolveToken } from "~/features/auth/tokens.server";
import { apiError } from "~/lib/api.server";
import type { Role } from "~/lib/roles";

export { findMembership } from "~/features/auth/session-context.server";
export type { GuardArgs, SignedIn };
export type Member = Membership & { user: NonNullable<SignedIn>["user"] };

const requestOf = (args: GuardArgs) => (args instanceof Request ? args : args.request);

/** The session and its user, or null. */
export function getSignedIn(args: GuardArgs) {
  return lookupOf(args).signedIn();
}

/** The signed-in user's membership (the session's active organisation, else the oldest), or null. */
export function getMembership(args: GuardArgs) {
  return lookupOf(args).membership();
}

function signInRedirect(request: Request) {
  const url = new URL(request.url);
  const back = url.pathname + url.search;
  return redirect(back === "/" ? "/sign-in" : `/sign-in?redirectTo=${encodeURIComponent(back)}`);
}

/** Page guard: redirects to sign-in without a session, to /welcome without an organisation, 403 for other roles. */
export async function requireMember(args: GuardArgs, options: { roles?: readonly Role[] } = {}): Promise<Member> {
  const lookup = lookupOf(args);
  const signedIn = await lookup.signedIn();
  if (!signedIn) throw signInRedirect(requestOf(args));
  const membership = await lookup.membership();
  if (!membership) throw redirect("/welcome");
  if (options.roles && !options.roles.includes(membership.role)) {
    throw data({ message: "Your role does not give access to this page." }, { status: 403 });
  }
  return { ...membership, user: signedIn.user };
}

/** Page guard for signed-in users who may not have an organisation yet. */
export async function requireUser(args: GuardArgs) {
  const signedIn = await lookupOf(args).signedIn();
  if (!signedIn) throw signInRedirect(requestOf(args));
  return signedIn;
}

/** API guard: a bearer token or a session; JSON 401 / 403 (`{ error: { message } }`) instead of redirects. */
export async function requireApiMember(args: GuardArgs, options: { roles?: readonly Role[] } = {}): Promise<Member> {
  const authorization = requestOf(args).headers.get("authorization");
  let user: NonNullable<SignedIn>["user"];
  let membership: Membership | null;
  if (authorization) {
    const byToken = await resolveToken(authorization);
    if (!byToken) throw apiError(401, "That API token is not valid: it may have been revoked.");
    user = byToken.user;
    membership = byToken.membership;
  } else {
    const lookup = lookupOf(args);
    const signedIn = await lookup.signedIn();
    if (!signedIn) throw apiError(401, "Sign in first, or send an API token (Authorization: Bearer …).");
    user = signedIn.user;
    membership = await lookup.membership();
  }
  if (!membership) throw apiError(403, "You belong to no organisation.");
  if (options.roles && !options.roles.includes(membership.role)) throw apiError(403, "Your role does not allow this.");
  return { ...membership, user };
}

