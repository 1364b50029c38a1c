// A photo's caption, changed with the version the page read (a stale copy answers 409).
import { getFormProps, useForm, type SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { Form, useNavigation } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { inputProps } from "~/lib/conform";
import { captionSchema } from "./schemas";

export function CaptionForm({ caption, version, lastResult }: { caption: string; version: number; lastResult?: SubmissionResult<string[]> | null }) {
  const navigation = useNavigation();
  const [form, fields] = useForm({ lastResult, defaultValue: { caption }, onValidate: ({ formData }) => parseWithZod(formData, { schema: captionSchema }), shouldValidate: "onSubmit" });
  return (
    <Form method="post" {...getFormProps(form)} className="flex flex-wrap items-end gap-3">
      <FormErrors errors={form.errors} />
      <input type="hidden" name="version" value={version} />
      <div className="min-w-0 flex-1">
        <Field label="Caption" maxLength={300} {...inputProps(fields.caption, "text")} />
      </div>
      <Button disabled={navigation.state === "submitting"}>Save caption</Button>
    </Form>
  );
}
