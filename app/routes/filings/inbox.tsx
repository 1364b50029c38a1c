// /filings: a regulator member's inbox (only the filings addressed to it), or for the owner,
// engineers and reviewers the organisation's filings; filters by site, authority and date range,
// each filing's bundle to download. Engineers and reviewers file issued assessments here.
import { createColumnHelper } from "@tanstack/react-table";
import { data, Form, Link } from "react-router";
import { Button } from "~/components/button";
import { DateText } from "~/components/date-text";
import { Field, FormErrors, SelectField, TextAreaField } from "~/components/field";
import { Card, PageHeader } from "~/components/panels";
import { TableShell } from "~/components/table-shell";
import { requireMember } from "~/features/auth/guard.server";
import { fileableAssessments, fileAssessment, filers, filingReaders, filterChoices, listFilings, regulators } from "~/features/filings/filings.server";
import { readerOf } from "~/features/filings/reader.server";
import { AUTHORITY_MAX, fileSchema, filterSchema, NOTE_MAX } from "~/features/filings/schemas";
import { standardLabels, tierLabels } from "~/features/exposure/options";
import type { StandardId, Tier } from "~/engine/limits";
import { redirectWithFlash } from "~/infra/flash.server";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm } from "~/lib/form.server";
import type { Role } from "~/lib/roles";
import type { Route } from "./+types/inbox";

export const meta: Route.MetaFunction = () => [{ title: "Filings · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: filingReaders });
  const parsed = filterSchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) throw data(Object.values(parsed.error.flatten().fieldErrors).flat().join(" ") || "Those filters are not valid.", { status: 400 });
  const reader = readerOf(member);
  const canFile = (filers as readonly Role[]).includes(member.role);
  const [rows, choices, fileable, regs] = await Promise.all([
    listFilings(reader, parsed.data),
    filterChoices(reader),
    canFile ? fileableAssessments(member.organizationId) : [],
    canFile ? regulators(member.organizationId) : [],
  ]);
  return {
    inbox: member.role === "regulator",
    canFile,
    filter: parsed.data,
    choices,
    filings: rows.map((f) => ({ id: f.id, filedAt: f.filedAt.toISOString(), siteName: f.siteName, city: f.city, assessmentName: f.assessmentName, standard: f.standard, tier: f.tier, authority: f.authority, filedByName: f.filedByName, note: f.note })),
    fileable: fileable.map((a) => ({ value: a.id, label: `${a.siteName}: ${a.name} (report v${a.version}, issued ${a.issuedAt?.toISOString().slice(0, 10) ?? "—"})` })),
    regulators: regs.map((r) => ({ value: r.memberId, label: `${r.name} <${r.email}>` })),
  };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: filers });
  const submission = await parseForm(request, fileSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  try {
    const f = await fileAssessment({ organizationId: member.organizationId, userId: member.user.id, role: member.role, name: member.user.name }, submission.value);
    return redirectWithFlash("/filings", { kind: "success", message: `Filed to ${f.authority}.` });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}

type Row = Route.ComponentProps["loaderData"]["filings"][number];
const column = createColumnHelper<Row>();
const standardText = (standard: string, tier: string) => `${standardLabels[standard as StandardId] ?? standard}, ${tierLabels[standard as StandardId]?.[tier as Tier] ?? tier}`;

const columns = [
  column.accessor("filedAt", { header: "Filed", cell: (c) => <span className="whitespace-nowrap"><DateText value={c.getValue()} /></span> }),
  column.accessor("siteName", { header: "Site", cell: (c) => <span className="break-words">{c.getValue()}{c.row.original.city ? `, ${c.row.original.city}` : ""}</span> }),
  column.accessor("assessmentName", { header: "Assessment", cell: (c) => <span className="break-words">{c.getValue()}<span className="block text-xs text-graphite-600">{standardText(c.row.original.standard, c.row.original.tier)}</span></span> }),
  column.accessor("authority", { header: "Authority", cell: (c) => <span className="break-words">{c.getValue()}</span> }),
  column.accessor("filedByName", { header: "Filed by", cell: (c) => <span className="break-words">{c.getValue()}{c.row.original.note ? <span className="block text-xs text-graphite-600">{c.row.original.note}</span> : null}</span> }),
  column.display({ id: "bundle", header: "Bundle", cell: (c) => <a className="link whitespace-nowrap font-medium" href={`/filings/${c.row.original.id}/bundle`} download>Download ZIP</a> }),
];

export default function Filings({ loaderData, actionData }: Route.ComponentProps) {
  const d = loaderData;
  const filtered = Boolean(d.filter.siteId || d.filter.authority || d.filter.from || d.filter.to);
  const errors = actionData && "error" in actionData ? (actionData.error as Record<string, string[] | null> | undefined) : undefined;
  const select = "rounded-control border border-rule bg-sheet px-2 py-2";
  return (
    <>
      <PageHeader title={d.inbox ? "Filings received" : "Filings"}>
        {d.inbox ? "Assessments filed to you. Each bundle holds the engine's runs, which re-run to the same bytes, with the inventory, the method and the issued report." : "Assessments your organisation has filed with regulators."}
      </PageHeader>
      <Form method="get" role="search" className="mb-4 flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Site</span>
          <select name="siteId" defaultValue={d.filter.siteId ?? ""} className={`max-w-64 ${select}`}>
            <option value="">Any site</option>
            {d.choices.sites.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Authority</span>
          <select name="authority" defaultValue={d.filter.authority ?? ""} className={`max-w-64 ${select}`}>
            <option value="">Any authority</option>
            {d.choices.authorities.map((a) => <option key={a} value={a}>{a}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">Filed from</span>
          <input type="date" name="from" defaultValue={d.filter.from ?? ""} className={select} />
        </label>
        <label className="flex flex-col gap-1">
          <span className="font-medium text-ink-700">to</span>
          <input type="date" name="to" defaultValue={d.filter.to ?? ""} className={select} />
        </label>
        <button type="submit" className="rounded-control bg-sheet px-3 py-2 font-medium ring-1 ring-rule hover:bg-paper">Show</button>
        {filtered ? <Link to="/filings" className="py-2 text-graphite-600 underline">Clear</Link> : null}
      </Form>
      <TableShell caption="Filings" stack columns={columns} rows={d.filings} empty={filtered ? "No filings match these filters." : d.inbox ? "Nothing has been filed to you yet." : "Nothing filed yet."} />
      {d.canFile ? (
        <div className="mt-6">
          <Card title="File an assessment">
            {d.fileable.length === 0 || d.regulators.length === 0 ? (
              <p className="text-sm text-graphite-600">{d.fileable.length === 0 ? "Only an assessment whose report is issued can be filed; none is yet." : "Invite a regulator to your organisation (role Regulator) to file to it."}</p>
            ) : (
              <Form method="post" className="space-y-2">
                <FormErrors errors={errors?.[""] ?? null} />
                <div className="grid gap-x-4 sm:grid-cols-2">
                  <SelectField id="assessmentId" name="assessmentId" label="Issued assessment" options={d.fileable} errors={errors?.assessmentId ?? undefined} />
                  <SelectField id="regulatorMemberId" name="regulatorMemberId" label="To the regulator" options={d.regulators} errors={errors?.regulatorMemberId ?? undefined} />
                </div>
                <Field id="authority" name="authority" label="Authority" maxLength={AUTHORITY_MAX} hint="Leave empty to use the office in the regulator's name, e.g. “Spectrum Safety Office”." errors={errors?.authority ?? undefined} />
                <TextAreaField id="note" name="note" label="Note to the regulator (optional)" maxLength={NOTE_MAX} errors={errors?.note ?? undefined} />
                <Button type="submit">File it</Button>
              </Form>
            )}
          </Card>
        </div>
      ) : null}
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
