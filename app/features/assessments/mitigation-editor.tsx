// The editable mitigation plan of a frozen assessment: the signs (move, change, remove, add), the
// barriers kept, the notes; and, read-only, the zones with the emitters to power down for work.
import type { SubmissionResult } from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import { Button } from "~/components/button";
import { controlClass, FormErrors } from "~/components/field";
import { SIGN_CATEGORIES, signLabels, type MitigationPlan } from "~/features/exposure/mitigation";
import { classShort } from "./class-map";
import { figure3 } from "./format";

const small = "block min-h-9 rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm text-ink-900";

export function replyErrors(result: SubmissionResult<string[]> | null | undefined) {
  if (!result?.error) return [];
  return Object.entries(result.error).flatMap(([field, messages]) => (messages ?? []).map((m) => (field ? `${field}: ${m}` : m)));
}

type Props = { plan: MitigationPlan; version: number; canEdit: boolean; result?: SubmissionResult<string[]> | null; labelOf: (id: string) => string; surfaces: { id: string; name: string }[] };

export function MitigationEditor({ plan, version, canEdit, result, labelOf, surfaces }: Props) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle" && navigation.formMethod === "POST";
  const errors = replyErrors(result);
  return (
    <div className="space-y-5">
      <p className="text-sm text-graphite-600">
        Proposed from the results; the engineer edits it. Signs follow the exposure categories of {plan.basis.signSource}: NOTICE above the general-population limit (with positive access control), CAUTION above the occupational limit, WARNING beyond ten times it. Power-down lists name every emitter over {plan.basis.powerDownThresholdPercent} % of its own limit somewhere in the zone.
      </p>
      <div>
        <h4 className="mb-2 font-semibold">Zones and power-down for work</h4>
        {plan.zones.length === 0 ? <p className="text-sm text-graphite-600">No walkable area is above the general-population limit.</p> : (
          <ul className="space-y-2">
            {plan.zones.map((z) => (
              <li key={z.id} className="rounded-sheet border border-rule bg-sheet p-3 text-sm">
                <p className="font-medium break-words">{z.surfaceName}: zone {z.id}, <span className="figures">{z.areaM2.toFixed(1)} m²</span> around ({z.centre[0].toFixed(1)}, {z.centre[1].toFixed(1)}) m, worst class: {classShort[z.worstClass]}</p>
                <p className="mt-1">Untrained people (general-population limit): {z.powerDown.general.length ? z.powerDown.general.map((e) => `${labelOf(e.id)} (${figure3(e.maxPercent)} %)`).join(", ") : "none over the threshold"}</p>
                {z.worstClass >= 2 ? <p className="mt-1">RF-trained workers (occupational limit): {z.powerDown.occupational.length ? z.powerDown.occupational.map((e) => `${labelOf(e.id)} (${figure3(e.maxPercent)} %)`).join(", ") : "none over the threshold"}</p> : null}
              </li>
            ))}
          </ul>
        )}
      </div>
      <FormErrors errors={errors} />
      <div>
        <h4 className="mb-1 font-semibold">Signs ({plan.signs.length})</h4>
        <p className="mb-2 text-sm text-graphite-600">Each row is saved on its own: change the category, move it (x, y in site metres), say where it stands.</p>
        <div className="overflow-x-auto rounded-sheet border border-rule bg-sheet">
          <table className="min-w-full text-sm">
            <caption className="sr-only">Signs</caption>
            <thead className="border-b border-ink-900">
              <tr>{["Sign", "Category", "x (m)", "y (m)", "Where", "Note", "Save or remove"].map((h, k) => <th key={k} scope="col" className="label-caps px-2 py-2 text-left font-medium">{h}</th>)}</tr>
            </thead>
            <tbody>
              {plan.signs.map((s) => {
                const form = `sign-${s.id}`;
                return (
                  <tr key={`${s.id}-${version}`} className="border-b border-rule align-top last:border-b-0">
                    <td className="px-2 py-2 figures">{s.id}<span className="block text-xs text-graphite-500">{s.origin}</span></td>
                    <td className="px-2 py-2"><select form={form} aria-label={`Category of ${s.id}`} name="signs[0].category" defaultValue={s.category} disabled={!canEdit} className={`${small} w-40`}>{SIGN_CATEGORIES.map((c) => <option key={c} value={c}>{signLabels[c]}</option>)}</select></td>
                    <td className="px-2 py-2"><input form={form} aria-label={`x of ${s.id}`} name="signs[0].x" defaultValue={s.x} inputMode="decimal" disabled={!canEdit} className={`${small} w-20`} /></td>
                    <td className="px-2 py-2"><input form={form} aria-label={`y of ${s.id}`} name="signs[0].y" defaultValue={s.y} inputMode="decimal" disabled={!canEdit} className={`${small} w-20`} /></td>
                    <td className="px-2 py-2"><input form={form} aria-label={`Where ${s.id} stands`} name="signs[0].where" defaultValue={s.where} maxLength={200} disabled={!canEdit} className={`${small} w-48`} /></td>
                    <td className="px-2 py-2"><input form={form} aria-label={`Note on ${s.id}`} name="signs[0].note" defaultValue={s.note} maxLength={500} disabled={!canEdit} className={`${small} w-48`} /></td>
                    <td className="px-2 py-2">
                      {canEdit ? (
                        <Form method="post" id={form} className="flex gap-1">
                          <input type="hidden" name="intent" value="save-plan" />
                          <input type="hidden" name="mitigationVersion" value={version} />
                          <input type="hidden" name="signs[0].id" value={s.id} />
                          <Button type="submit" tone="secondary" size="sm" disabled={busy} aria-label={`Save ${s.id}`}>Save</Button>
                          <Button type="submit" tone="quiet" size="sm" name="signs[0].remove" value="on" disabled={busy} aria-label={`Remove ${s.id}`}>Remove</Button>
                        </Form>
                      ) : null}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </div>
      <div>
        <h4 className="mb-2 font-semibold">Barriers</h4>
        {plan.barriers.length === 0 ? <p className="text-sm text-graphite-600">None proposed.</p> : (
          <ul className="space-y-1 text-sm">
            {plan.barriers.map((b) => (
              <li key={b.id} className="flex flex-wrap items-center gap-2">
                <span>{b.id}: along the {b.boundary === "general" ? "general-population" : "occupational"} 100 % line, <span className="figures">{b.lengthM.toFixed(1)} m</span> in {b.lines.length} run{b.lines.length === 1 ? "" : "s"}</span>
                {canEdit ? (
                  <Form method="post">
                    <input type="hidden" name="intent" value="save-plan" />
                    <input type="hidden" name="mitigationVersion" value={version} />
                    <input type="hidden" name="removeBarriers[0]" value={b.id} />
                    <Button type="submit" tone="quiet" size="sm" disabled={busy} aria-label={`Remove barrier ${b.id}`}>Remove</Button>
                  </Form>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </div>
      <Form method="post" className="space-y-2">
        <input type="hidden" name="intent" value="save-plan" />
        <input type="hidden" name="mitigationVersion" value={version} />
        <label htmlFor="plan-notes" className="block text-sm font-medium">Notes</label>
        <textarea key={version} id="plan-notes" name="notes" rows={3} maxLength={4000} defaultValue={plan.notes} disabled={!canEdit} className={controlClass} />
        {canEdit ? <Button type="submit" disabled={busy}>Save the notes</Button> : null}
      </Form>
      {canEdit ? (
        <Form method="post" className="space-y-2 rounded-sheet border border-rule bg-sheet p-3" aria-label="Add a sign">
          <h4 className="font-semibold">Add a sign</h4>
          <input type="hidden" name="intent" value="add-sign" />
          <input type="hidden" name="mitigationVersion" value={version} />
          <div className="grid gap-2 sm:grid-cols-[12rem_10rem_6rem_6rem_1fr]">
            <label className="text-sm">Surface<select name="surfaceId" className={`${small} w-full`}>{surfaces.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}</select></label>
            <label className="text-sm">Category<select name="category" className={`${small} w-full`} defaultValue="notice">{SIGN_CATEGORIES.map((c) => <option key={c} value={c}>{signLabels[c]}</option>)}</select></label>
            <label className="text-sm">x (m)<input name="x" inputMode="decimal" required className={`${small} w-full`} /></label>
            <label className="text-sm">y (m)<input name="y" inputMode="decimal" required className={`${small} w-full`} /></label>
            <label className="text-sm">Where<input name="where" maxLength={200} className={`${small} w-full`} /></label>
          </div>
          <label className="block text-sm">Note<input name="note" maxLength={500} className={`${small} w-full`} /></label>
          <Button type="submit" tone="secondary" disabled={busy}>Add the sign</Button>
        </Form>
      ) : null}
    </div>
  );
}
