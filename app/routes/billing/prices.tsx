// /billing/prices: the price list (assessment fee, certificate fee, rush surcharge), synced to
// Stripe Products and Prices, and the organisation's currency.
import { data, Form, useNavigation } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors, SelectField } from "~/components/field";
import { Card, Notice, PageHeader } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { BillingTabs, replyErrors } from "~/features/billing/billing-nav";
import { currencies, decimalOf, formatMoney } from "~/features/billing/money";
import { listPrices, priceKindLabels, savePrice, setCurrency } from "~/features/billing/prices.server";
import { currencySchema, priceSchema } from "~/features/billing/schemas";
import { billingSettingsOf } from "~/features/billing/settings.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { priceKinds } from "~/infra/db/schema/billing";
import { domainErrorReply } from "~/lib/domain-error";
import { parseForm, readFormData } from "~/lib/form.server";
import type { Route } from "./+types/prices";

const billingRoles = ["owner", "billing"] as const;
export const meta: Route.MetaFunction = () => [{ title: "Prices · Isotrope" }];

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const [settings, prices] = await Promise.all([billingSettingsOf(member.organizationId), listPrices(member.organizationId)]);
  return { currency: settings.currency, prices: priceKinds.map((kind) => ({ kind, label: priceKindLabels[kind], price: prices.find((p) => p.kind === kind) ?? null })) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = await requireMember({ request, context }, { roles: billingRoles });
  const form = await readFormData(request);
  const actor = { organizationId: member.organizationId, userId: member.user.id };
  if (form.get("intent") === "currency") {
    const submission = await parseForm(form, currencySchema);
    if (submission.status !== "success") return data({ kind: "currency", reply: submission.reply() }, { status: 400 });
    try {
      await setCurrency(actor, submission.value.currency);
    } catch (error) {
      const answer = domainErrorReply(error, submission);
      return data({ kind: "currency", reply: answer.data }, answer.init ?? undefined);
    }
    return redirectWithFlash("/billing/prices", { kind: "success", message: `Invoices and prices are now in ${submission.value.currency.toUpperCase()}.` });
  }
  const submission = await parseForm(form, priceSchema);
  const kind = String(form.get("kind") ?? "");
  if (submission.status !== "success") return data({ kind, reply: submission.reply() }, { status: 400 });
  try {
    const { intent: _i, ...input } = submission.value;
    const saved = await savePrice(actor, input);
    return redirectWithFlash("/billing/prices", { kind: "success", message: `${saved.name} is ${formatMoney(saved.amount, saved.currency)}${saved.active ? "" : " (not on sale)"}.` });
  } catch (error) {
    const answer = domainErrorReply(error, submission);
    return data({ kind, reply: answer.data }, answer.init ?? undefined);
  }
}

export default function Prices({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state === "submitting";
  const errorsFor = (kind: string) => (actionData?.kind === kind ? replyErrors(actionData.reply) : { form: [], fields: {} as Record<string, string[]> });
  const cur = errorsFor("currency");
  return (
    <>
      <PageHeader title="Billing">The price list. Each price is a Product with one active Price at the payment service; a new amount makes a new Price there.</PageHeader>
      <BillingTabs />
      <div className="grid gap-6 md:grid-cols-2">
        {loaderData.prices.map(({ kind, label, price }) => {
          const e = errorsFor(kind);
          return (
            <Card key={kind} title={label}>
              <Form method="post" className="space-y-2">
                <input type="hidden" name="intent" value="save-price" />
                <input type="hidden" name="kind" value={kind} />
                <FormErrors errors={e.form} />
                <Field id={`${kind}-name`} name="name" label="Name on invoices" defaultValue={price?.name ?? label} maxLength={120} errors={e.fields.name} required />
                <Field id={`${kind}-amount`} name="amount" label={`Amount (${loaderData.currency.toUpperCase()})`} inputMode="decimal" defaultValue={price ? decimalOf(price.amount) : ""} errors={e.fields.amount} hint="For example 450.00; no tax is added." required />
                <label className="flex items-center gap-2 text-sm">
                  <input type="checkbox" name="active" defaultChecked={price?.active ?? true} /> On sale
                </label>
                <div className="flex flex-wrap items-center justify-between gap-3 pt-2">
                  <span className="min-w-0 text-xs text-graphite-600 [overflow-wrap:anywhere]">{price?.stripePriceId ? <>Stripe price <span className="figures">{price.stripePriceId}</span></> : "Not yet at the payment service"}</span>
                  <Button size="sm" disabled={busy}>Save {label.toLowerCase()}</Button>
                </div>
              </Form>
            </Card>
          );
        })}
        <Card title="Currency">
          <Form method="post" className="space-y-2">
            <input type="hidden" name="intent" value="currency" />
            <FormErrors errors={cur.form} />
            <SelectField id="currency" name="currency" label="Currency of prices and invoices" defaultValue={loaderData.currency} errors={cur.fields.currency} options={currencies.map((c) => ({ value: c, label: c.toUpperCase() }))} />
            <Notice state="info">Set it before the first invoice; it cannot change afterwards. Existing prices take it when next saved.</Notice>
            <div className="pt-2"><Button size="sm" tone="secondary" disabled={busy}>Change currency</Button></div>
          </Form>
        </Card>
      </div>
    </>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
