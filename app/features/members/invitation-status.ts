// Why an invitation can't be used any more, in words, with the next step to offer. Pure.

export type InvitationStatus = "pending" | "accepted" | "canceled" | "superseded" | (string & {});

export type InvitationFacts = {
  status: InvitationStatus;
  expiresAt: Date;
  organizationName: string;
  inviterName: string | null;
};

export type NextStep = { label: string; to: string };

/** The reason an invitation can't be accepted now, or null when it can. */
export function invitationProblem(inv: InvitationFacts, now = new Date()): string | null {
  const who = inv.inviterName ? `${inv.inviterName} at ${inv.organizationName}` : inv.organizationName;
  switch (inv.status) {
    case "pending":
      return inv.expiresAt <= now ? `This invitation has expired. Ask ${who} to send a new one.` : null;
    case "accepted":
      return "This invitation has already been used. Sign in to continue.";
    case "superseded":
      return `${inv.organizationName} sent you a newer invitation, which replaces this one. Use the link in the most recent invitation e-mail.`;
    default:
      return `${inv.organizationName} withdrew this invitation. Ask ${who} if you still need access.`;
  }
}

/** Where a person can go from an invitation they can't use. */
export function nextStepAfter(signedIn: boolean): NextStep {
  return signedIn ? { label: "Continue to Isotrope", to: "/" } : { label: "Go to sign-in", to: "/sign-in" };
}
