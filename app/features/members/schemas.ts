// Zod schemas of the organisation and members forms; used in the browser and on the server.
import { z } from "zod";
import { emailAddress, identifier, shortText } from "~/lib/fields";
import { roles } from "~/lib/roles";

export const ORGANIZATION_NAME_MAX = 120;

export const organizationSchema = z.object({
  name: shortText(ORGANIZATION_NAME_MAX, "Name your consultancy.", 2),
});

export const inviteSchema = z
  .object({
    intent: z.literal("invite"),
    email: emailAddress("Enter the e-mail address of the person you are inviting."),
    role: z.enum(roles, { error: "Pick a role." }),
    /** For the client role: the client whose sites and documents this person may see. */
    clientId: identifier().optional(),
  })
  .refine((v) => v.role !== "client" || Boolean(v.clientId), { message: "Choose the client this person may see.", path: ["clientId"] });

export const changeRoleSchema = z.object({
  intent: z.literal("change-role"),
  memberId: identifier(),
  role: z.enum(roles, { error: "Pick a role." }),
});

export const removeMemberSchema = z.object({ intent: z.literal("remove"), memberId: identifier() });

export const cancelInviteSchema = z.object({ intent: z.literal("cancel-invite"), invitationId: identifier() });

export const memberActionSchema = z.discriminatedUnion("intent", [inviteSchema, changeRoleSchema, removeMemberSchema, cancelInviteSchema]);
