// The top-level field names of a Zod form schema, and whether each takes a plain value or nested
// paths (lists, objects). Reads Zod 4's schema definitions; unions contribute every option's fields.
import type { $ZodType } from "zod/v4/core";

export type FieldKind = "plain" | "nested";

type Def = {
  type: string;
  shape?: Record<string, $ZodType>;
  options?: $ZodType[];
  in?: $ZodType;
  innerType?: $ZodType;
  left?: $ZodType;
  right?: $ZodType;
};
const defOf = (schema: $ZodType) => schema._zod.def as unknown as Def;

/** Strips wrappers (optional, default, pipe …) down to the schema that decides the value's shape. */
function core(schema: $ZodType): $ZodType {
  const def = defOf(schema);
  if (def.innerType) return core(def.innerType);
  if (def.type === "pipe" && def.in) return core(def.in);
  return schema;
}

const NESTED = new Set(["object", "array", "record", "tuple", "map", "set", "union", "intersection", "any", "unknown"]);

export function fieldsOf(schema: $ZodType, into = new Map<string, FieldKind>()): Map<string, FieldKind> {
  const def = defOf(core(schema));
  if (def.type === "object" && def.shape) {
    for (const [name, field] of Object.entries(def.shape)) {
      const kind: FieldKind = NESTED.has(defOf(core(field)).type) ? "nested" : "plain";
      into.set(name, into.get(name) === "nested" ? "nested" : kind);
    }
  } else if (def.type === "union" && def.options) {
    for (const option of def.options) fieldsOf(option, into);
  } else if (def.type === "intersection" && def.left && def.right) {
    fieldsOf(def.left, into);
    fieldsOf(def.right, into);
  } else {
    throw new Error(`A form schema must be an object, a union of objects or an intersection; got ${def.type}.`);
  }
  return into;
}

/** `contacts[2].email` → `contacts`; `email` → `email`. */
export const topLevelName = (name: string) => name.split(/[.[]/, 1)[0];
