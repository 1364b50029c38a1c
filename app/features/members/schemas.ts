// Zod schemas of the organisation and members forms; used in the browser and on the server.
import { z } from "zod";
import { email } from "~/features/auth/schemas";
import { roles } from "~/lib/roles";

export const organizationSchema = z.object({
  name: z.string({ error: "Name your consultancy." }).trim().min(2, "Name your consultancy.").max(120),
});

export const inviteSchema = z.object({
  intent: z.literal("invite"),
  email,
  role: z.enum(roles, { error: "Pick a role." }),
});

export const changeRoleSchema = z.object({
  intent: z.literal("change-role"),
  memberId: z.string().min(1),
  role: z.enum(roles, { error: "Pick a role." }),
});

export const removeMemberSchema = z.object({ intent: z.literal("remove"), memberId: z.string().min(1) });

export const cancelInviteSchema = z.object({ intent: z.literal("cancel-invite"), invitationId: z.string().min(1) });

export const memberActionSchema = z.discriminatedUnion("intent", [inviteSchema, changeRoleSchema, removeMemberSchema, cancelInviteSchema]);
