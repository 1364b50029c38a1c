// What the overview tells each role: what it can do in the portal today and the one next step.
// Only what is built is named here; nothing is promised.
import type { Role } from "~/lib/roles";

export type Team = { members: number; pending: number };
/** How much inventory the organisation has recorded (staff roles only). */
export type Inventory = { sites: number; clients: number };
export type NextStep = { title: string; text: string; to: string; action: string };
export type Guide = { now: string[]; next: NextStep };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function ownerNext(team: Team): NextStep {
  if (team.pending > 0) {
    return {
      title: `${plural(team.pending, "invitation", "invitations")} waiting`,
      text: "An invitation lasts 7 days. Send one again from Members if it has lapsed or gone astray.",
      to: "/members",
      action: "Open Members",
    };
  }
  if (team.members <= 1) {
    return {
      title: "Invite your first colleague",
      text: "Nobody else belongs to the organisation yet. Invite them by e-mail and choose their role.",
      to: "/members",
      action: "Invite someone",
    };
  }
  return {
    title: "Keep the team up to date",
    text: "Check that everyone who signs in still needs to, and in the right role.",
    to: "/members",
    action: "Open Members",
  };
}

const accountNext: NextStep = {
  title: "Check your account",
  text: "Make sure your name and e-mail are right. You can change your password there at any time.",
  to: "/account",
  action: "Open Account",
};

const memberNow = [
  "See your organisation and the role its owner gave you.",
  "Change your password from Account; other devices are signed out when you do.",
  "Nothing else in the portal is open to your role at present. Your organisation's owner can tell you more.",
];

const inventoryNow = [
  "Record clients (landlords, property companies) and their contacts.",
  "Record sites: the walkable areas and facades, the emitters, and visits with photos and readings.",
  "See every change to a site, who made it and when, in its History.",
];

/** The analysis and documents, as each inventory role may take part in them (lifecycle.ts, filings). */
const exposureNow = "Map the exposure on every level, try what-if changes, and freeze an assessment with its mitigation plan.";
const draftNow = "Draft a report, landlord letter or certificate from an assessment and send it for review.";
const reviewNow = "Review and issue the documents your colleagues drafted; never your own (two-person rule).";
const fileNow = "File an issued assessment with a regulator from Filings.";
const billingNow = [
  "Make an invoice for a client from its assessments and the price list, and send it with a pay link.",
  "Follow payments as they arrive, refund all or part of one, and download them as CSV.",
  "Keep the price list: assessment fee, certificate fee, rush surcharge.",
];

function sitesNext(inventory: Inventory): NextStep {
  if (inventory.sites === 0) {
    return { title: "Record your first site", text: "Start with its address and client, then draw its layout and add its emitters.", to: "/sites", action: "Open Sites" };
  }
  return {
    title: `${plural(inventory.sites, "site", "sites")} on record`,
    text: "Keep each site's layout, emitters and readings current and complete.",
    to: "/sites",
    action: "Open Sites",
  };
}

export function guideFor(role: Role, team: Team | null, inventory: Inventory | null = null): Guide {
  if (role === "engineer" && inventory) {
    return { now: [...inventoryNow, exposureNow, draftNow, fileNow, "Change your password from Account."], next: sitesNext(inventory) };
  }
  if (role === "reviewer" && inventory) {
    return { now: [...inventoryNow, exposureNow, draftNow, reviewNow, fileNow, "Change your password from Account."], next: sitesNext(inventory) };
  }
  if (role === "billing" && inventory) {
    return {
      now: [...billingNow, "Read the clients and sites your organisation records (read-only).", "Change your password from Account."],
      next: { title: "Invoices and payments", text: "See which invoices are open, paid or refunded, or make a new one.", to: "/billing", action: "Open Billing" },
    };
  }
  if (role === "owner") {
    return {
      now: [
        "Invite colleagues by e-mail and choose each one's role.",
        "Change a member's role or remove them; withdraw an invitation or send it again.",
        ...(inventory ? [inventoryNow[1], exposureNow, draftNow, "Make invoices, follow payments and refund them in Billing.", "Read every change anyone made in History."] : []),
        "Change your own password from Account.",
      ],
      next: team && team.members <= 1 ? ownerNext(team) : inventory && inventory.sites === 0 ? sitesNext(inventory) : ownerNext(team ?? { members: 1, pending: 0 }),
    };
  }
  if (role === "regulator") {
    return {
      now: ["Read the filings sent to you, by site, authority and date.", "Download each as one bundle: the engine's runs (they re-run to the same bytes), the inventory, the method and the issued PDF.", "Change your password from Account."],
      next: { title: "Filings received", text: "Open your inbox of filings and download a bundle.", to: "/filings", action: "Open Filings" },
    };
  }
  return { now: memberNow, next: accountNext };
}
