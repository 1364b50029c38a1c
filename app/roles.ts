// The roles of DESIGN.md §2 and what each may open. Shared by server and browser.
export const roles = ["owner", "engineer", "reviewer", "billing", "client", "regulator"] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  owner: "Owner",
  engineer: "Engineer",
  reviewer: "Reviewing engineer",
  billing: "Billing",
  client: "Client (landlord)",
  regulator: "Regulator",
};

export const roleSummaries: Record<Role, string> = {
  owner: "Everything in the organisation; invites members and sets roles.",
  engineer: "Clients, sites, emitters, visits and readings; runs assessments; drafts documents.",
  reviewer: "All an engineer may, plus approving and issuing documents someone else wrote.",
  billing: "Invoices, payments, refunds and prices; reads sites.",
  client: "Its own sites' issued letters, maps and certificates.",
  regulator: "Assessments filed to its authority; read-only.",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (roles as readonly string[]).includes(value);
}

/** Sections of the portal and the roles that may open each. */
export const sections = {
  overview: { path: "/", label: "Overview", roles: roles },
  members: { path: "/members", label: "Members", roles: ["owner"] },
  account: { path: "/account", label: "Account", roles: roles },
} as const satisfies Record<string, { path: string; label: string; roles: readonly Role[] }>;

export type Section = keyof typeof sections;

export function mayOpen(role: Role, section: Section) {
  return (sections[section].roles as readonly Role[]).includes(role);
}
