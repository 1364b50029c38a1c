import { roleLabels, roles } from "~/lib/roles";

/** The roles as select options, in the order of DESIGN.md §2. */
export const roleOptions = roles.map((r) => ({ value: r, label: roleLabels[r] }));
