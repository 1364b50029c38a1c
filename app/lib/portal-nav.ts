// The client portal's navigation: what a `client` member (a landlord) sees in the header instead of
// the staff sections. One plain list; each portal page adds a line here.
export type PortalNavItem = { path: string; label: string };

export const portalNav: PortalNavItem[] = [
  { path: "/portal", label: "Your sites" },
  { path: "/portal/invoices", label: "Invoices" },
  { path: "/portal/certificates", label: "Certificates" },
  { path: "/account", label: "Account" },
];

/** Where a client member lands after signing in (and where "/" sends it). */
export const PORTAL_HOME = "/portal";
