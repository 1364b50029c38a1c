import { useState } from "react";
import { readFormData } from "~/lib/form.server";
import { Form, Link, useSearchParams, type ShouldRevalidateFunction } from "react-router";
import { Button, ButtonLink } from "~/components/button";
import { RfCautions } from "~/components/cautions";
import { Dialog } from "~/components/dialog";
import { FormErrors } from "~/components/field";
import { Card } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { AddReading } from "~/features/visits/add-reading";
import { calibrationWarnings } from "~/features/visits/calibration";
import { PhotoGrid } from "~/features/visits/photo-grid";
import { PhotoUploader } from "~/features/visits/photo-uploader";
import { listPhotos } from "~/features/visits/photos.server";
import { ReadingsImport } from "~/features/visits/readings-import";
import { ReadingsTable } from "~/features/visits/readings-table";
import { listReadings, siteSurfaces } from "~/features/visits/readings.server";
import { CalibrationWarnings, VisitDetails } from "~/features/visits/visit-details";
import { VisitForm } from "~/features/visits/visit-form";
import { visitPageAction } from "~/features/visits/visit-page-actions.server";
import { findVisit } from "~/features/visits/visits.server";
import { formatDate } from "~/lib/dates";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/visit";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `Visit on ${formatDate(data.visit.visitedOn)} · ${data.visit.siteName} · Isotrope` : "Visit · Isotrope" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireMember(request, { roles: staffRoles });
  const visit = found(await findVisit(scopeOf(member), params.visitId, params.siteId), "No such visit on this site.");
  const [photos, readings, surfaces] = await Promise.all([listPhotos(visit.id), listReadings(visit.id), siteSurfaces(visit.siteId)]);
  return { visit, photos, readings, surfaces, warnings: calibrationWarnings(visit.visitedOn, visit.instruments), canEdit: canEditInventory(member.role) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const member = await requireMember(request, { roles: inventoryEditors });
  return visitPageAction(member, params, await readFormData(request));
}

/** After a refused stale edit (409) the page reloads its data, so the table shows what the other person saved. */
export const shouldRevalidate: ShouldRevalidateFunction = ({ actionStatus, defaultShouldRevalidate }) => actionStatus === 409 || defaultShouldRevalidate;

export default function VisitPage({ loaderData, actionData }: Route.ComponentProps) {
  const { visit, photos, readings, surfaces, warnings, canEdit } = loaderData;
  const [params] = useSearchParams();
  const [confirm, setConfirm] = useState(false);
  const base = `/sites/${visit.siteId}/visits/${visit.id}`;
  const formReply = actionData && "status" in actionData ? actionData : null;
  const deleteError = actionData && "message" in actionData && actionData.intent === "delete-visit" ? actionData.message : null;
  if (canEdit && (params.has("edit") || formReply)) {
    return (
      <section aria-labelledby="visit-edit-title">
        <h2 id="visit-edit-title" className="mb-4 text-lg font-semibold">
          Edit the visit of {formatDate(visit.visitedOn)}
        </h2>
        <VisitForm lastResult={formReply} intent="save-visit" defaults={visit} submitLabel="Save the visit" cancelTo={base} />
      </section>
    );
  }
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-graphite-600">
            <Link to={`/sites/${visit.siteId}/visits`} className="underline">
              Visits
            </Link>
          </p>
          <h2 className="text-lg font-semibold">Visit on {formatDate(visit.visitedOn)}</h2>
        </div>
        {canEdit ? (
          <div className="flex gap-2">
            <ButtonLink to="?edit">Edit visit</ButtonLink>
            <Button type="button" tone="danger" onClick={() => setConfirm(true)}>
              Delete visit
            </Button>
          </div>
        ) : null}
      </div>
      <FormErrors errors={deleteError ? [deleteError] : null} />
      <CalibrationWarnings warnings={warnings} />
      <Card title="Details">
        <VisitDetails people={visit.people} conditions={visit.conditions} notes={visit.notes} instruments={visit.instruments} warnings={warnings} />
      </Card>
      <Card title={`Photos (${photos.length})`}>
        <div className="space-y-4">
          <PhotoGrid photos={photos} basePath={base} />
          {canEdit ? <PhotoUploader visitId={visit.id} /> : null}
        </div>
      </Card>
      <Card title={`Readings (${readings.length})`}>
        <div className="space-y-5">
          <p className="text-sm text-graphite-600">
            Each reading is kept as entered and converted to power density by the plane-wave relations S = E²/η₀ = η₀H², with η₀ = 376.73 Ω (free space). A reading in % of a
            limit uses that standard's limit at the reading's frequency; a broadband % reading has no power density.
          </p>
          <ReadingsTable readings={readings} surfaces={surfaces} canEdit={canEdit} />
          {canEdit ? (
            <>
              <section aria-labelledby="add-reading-title" className="rounded-control border border-rule p-3">
                <h3 id="add-reading-title" className="mb-2 text-sm font-semibold text-ink-900">
                  Add a reading
                </h3>
                <AddReading surfaces={surfaces} />
              </section>
              <section aria-labelledby="import-readings-title" className="rounded-control border border-rule p-3">
                <h3 id="import-readings-title" className="mb-2 text-sm font-semibold text-ink-900">
                  Import readings from a CSV file
                </h3>
                <ReadingsImport visitId={visit.id} />
              </section>
            </>
          ) : null}
        </div>
      </Card>
      {/* Readings are exposure results: the cautions of DESIGN.md §5 go with them. */}
      {readings.length ? <RfCautions /> : null}
      <Dialog open={confirm} onClose={() => setConfirm(false)} title="Delete this visit?">
        <p className="text-sm text-graphite-600">
          The visit of {formatDate(visit.visitedOn)} is removed with its {photos.length} photo{photos.length === 1 ? "" : "s"} and {readings.length} reading{readings.length === 1 ? "" : "s"}. History keeps a record of it.
        </p>
        <Form method="post" className="mt-4 flex justify-end gap-2" onSubmit={() => setConfirm(false)}>
          <input type="hidden" name="intent" value="delete-visit" />
          <Button type="button" tone="secondary" onClick={() => setConfirm(false)}>
            Keep
          </Button>
          <Button tone="danger">Delete</Button>
        </Form>
      </Dialog>
    </div>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
