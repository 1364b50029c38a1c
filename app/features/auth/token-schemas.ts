import { z } from "zod";
import { requiredText } from "~/lib/fields";

export const tokenCreateSchema = z.strictObject({ name: requiredText("a name for the token (what will use it)", 80) });
