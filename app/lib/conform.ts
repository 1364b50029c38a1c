import { getInputProps, getSelectProps, getTextareaProps, type FieldMetadata } from "@conform-to/react";

/** Conform's input props without the React key, ready to spread into <Field>. */
export function inputProps<T>(field: FieldMetadata<T>, type: "text" | "email" | "password" | "number" | "search" | "tel" | "date") {
  const { key: _key, ...props } = getInputProps(field, { type });
  return { ...props, id: field.id, errors: field.errors };
}

export function textareaProps<T>(field: FieldMetadata<T>) {
  const { key: _key, ...props } = getTextareaProps(field);
  return { ...props, id: field.id, errors: field.errors };
}

export function selectProps<T>(field: FieldMetadata<T>) {
  const { key: _key, ...props } = getSelectProps(field);
  return { ...props, id: field.id, errors: field.errors };
}
