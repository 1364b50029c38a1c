// The roles of DESIGN.md §2 and what each may open. Shared by server and browser.
import { portalNav, type PortalNavItem } from "./portal-nav";

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

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (roles as readonly string[]).includes(value);
}

/** The consultancy's own people: they read the inventory (billing read-only). */
export const staffRoles = ["owner", "engineer", "reviewer", "billing"] as const satisfies readonly Role[];
/** Who records and edits clients, sites, emitters, visits and readings. */
export const inventoryEditors = ["owner", "engineer", "reviewer"] as const satisfies readonly Role[];

export function canEditInventory(role: Role) {
  return (inventoryEditors as readonly Role[]).includes(role);
}

/** Sections of the portal and the roles that may open each. */
export const sections = {
  overview: { path: "/", label: "Overview", roles: roles },
  sites: { path: "/sites", label: "Sites", roles: staffRoles },
  clients: { path: "/clients", label: "Clients", roles: staffRoles },
  patterns: { path: "/patterns", label: "Patterns", roles: staffRoles },
  filings: { path: "/filings", label: "Filings", roles: ["owner", "engineer", "reviewer", "regulator"] },
  billing: { path: "/billing", label: "Billing", roles: ["owner", "billing"] },
  history: { path: "/history", label: "History", roles: ["owner"] },
  members: { path: "/members", label: "Members", roles: ["owner"] },
  account: { path: "/account", label: "Account", roles: roles },
} as const satisfies Record<string, { path: string; label: string; roles: readonly Role[] }>;

/** The sections a role may open, in navigation order; a client member gets the portal's own list. */
export function sectionsFor(role: Role): readonly PortalNavItem[] {
  if (role === "client") return portalNav;
  return Object.values(sections).filter((s) => (s.roles as readonly Role[]).includes(role));
}
