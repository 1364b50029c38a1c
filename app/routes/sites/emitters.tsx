import { useMemo, useState } from "react";
import { readFormData } from "~/lib/form.server";
import { Button } from "~/components/button";
import { Card, EmptyState } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { EmitterForm } from "~/features/emitters/emitter-form";
import { EmitterLayer, OperatorLegend } from "~/features/emitters/emitter-layer";
import { EmitterTable } from "~/features/emitters/emitter-table";
import { ImportPanel } from "~/features/emitters/import-panel";
import { emittersPageAction } from "~/features/emitters/page-actions.server";
import { emittersSection } from "~/features/emitters/section.server";
import { SitePlan } from "~/features/layout/site-plan";
import type { XY } from "~/features/layout/plan-frame";
import { scopeOf } from "~/features/sites/scope.server";
import { findSite, findSiteForRequest } from "~/features/sites/sites.server";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/emitters";

export const meta: Route.MetaFunction = () => [{ title: "Emitters · Isotrope" }];

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const site = found(await findSiteForRequest({ request, context }, scopeOf(member), params.siteId), "No such site in your organisation.");
  return { siteId: site.id, siteName: site.name, canEdit: canEditInventory(member.role), ...(await emittersSection(member.organizationId, site.id)) };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: inventoryEditors });
  found(await findSite(scopeOf(member), params.siteId), "No such site in your organisation.");
  return emittersPageAction(member, params.siteId, await readFormData(request));
}

const newRow = { label: "", operator: "", band: "", frequencyMHz: "", power: "", powerUnit: "W", carriers: "1", lossDb: "0", gain: "", gainUnit: "dBi", patternChoice: "", azimuthDeg: "0", mechanicalTiltDeg: "0", electricalTiltDeg: "0", x: "0", y: "0", z: "0", model: "spherical", dutyFactor: "1", actualMaxFactor: "1", tddFactor: "1", active: "on", notes: "" };

export default function EmittersSection({ loaderData }: Route.ComponentProps) {
  const { siteId, siteName, canEdit, emitters, library, surfaces, obstructions, accessPoints } = loaderData;
  const [adding, setAdding] = useState(false);
  const [formKey, setFormKey] = useState(0);
  const points = useMemo(() => emitters.map((e) => [e.x, e.y] as XY), [emitters]);
  return (
    <section aria-labelledby="emitters-title" className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="emitters-title" className="text-lg font-semibold">
          Emitters <span className="font-normal text-graphite-600">({emitters.length})</span>
        </h2>
        <div className="flex flex-wrap gap-2">
          {emitters.length ? (
            <a href={`/api/v1/sites/${siteId}/emitters/csv`} download className="rounded-control bg-sheet px-3 py-1.5 text-sm font-medium ring-1 ring-rule-strong hover:bg-paper">
              Export CSV
            </a>
          ) : null}
          {canEdit ? (
            <Button size="sm" onClick={() => setAdding((a) => !a)} aria-expanded={adding}>
              {adding ? "Close the new row" : "Add an emitter"}
            </Button>
          ) : null}
        </div>
      </div>
      {canEdit && adding ? (
        <Card title="New emitter">
          <EmitterForm key={formKey} intent="add-emitter" formId={`new-emitter-${formKey}`} defaults={newRow} library={library} submitLabel="Add emitter" onDone={() => setFormKey((k) => k + 1)} onCancel={() => setAdding(false)} />
        </Card>
      ) : null}
      {emitters.length ? (
        <EmitterTable rows={emitters} library={library} canEdit={canEdit} />
      ) : (
        <EmptyState title="No emitters on this site yet">{canEdit ? "Add them one by one, or import a CSV file below." : "An engineer records them here."}</EmptyState>
      )}
      {emitters.length ? (
        <div className="space-y-2">
          <h3 className="text-base font-semibold">On the plan</h3>
          <OperatorLegend emitters={emitters} />
          <SitePlan title={`Emitters on the plan of ${siteName}`} surfaces={surfaces} obstructions={obstructions} accessPoints={accessPoints} extraPoints={points}>
            {(frame) => <EmitterLayer frame={frame} emitters={emitters} />}
          </SitePlan>
        </div>
      ) : null}
      {canEdit ? (
        <Card title="Import from a CSV file">
          <ImportPanel siteId={siteId} count={emitters.length} />
        </Card>
      ) : null}
    </section>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
