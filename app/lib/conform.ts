import { getInputProps, type FieldMetadata } from "@conform-to/react";

/** Conform's input props without the React key, ready to spread into <Field>. */
export function inputProps<T>(field: FieldMetadata<T>, type: "text" | "email" | "password") {
  const { key: _key, ...props } = getInputProps(field, { type });
  return { ...props, id: field.id, errors: field.errors };
}
