// The signed-in member as a filings reader (its organisation, role and member id: a regulator's inbox is keyed on it).
import type { Member } from "~/features/auth/guard.server";
import type { FilingReader } from "./filings.server";

export const readerOf = (member: Member): FilingReader => ({ organizationId: member.organizationId, role: member.role, memberId: member.memberId });
