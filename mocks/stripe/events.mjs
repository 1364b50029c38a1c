// Events: built as Stripe's, kept in memory (GET /v1/events, /_fake/events), and posted to the
// webhook URL signed with the webhook secret. A delivery that gets no 2xx (5xx, 4xx, timeout,
// connection refused) is retried after each of config.retryDelaysMs, as Stripe retries any non-2xx.
import { API_VERSION } from "./config.mjs";
import { signatureHeader } from "./signing.mjs";
import { clone, newId, now } from "./util.mjs";

export function createEvents(config) {
  /** @type {Map<string, { event: any, payload: string, deliveries: any[] }>} newest last */
  const records = new Map();

  function log(message) {
    if (process.env.STRIPE_FAKE_QUIET !== "1") console.log(`[stripe-fake] ${message}`);
  }

  /** One POST of the stored payload with a fresh signature; never throws. */
  async function attempt(record, kind) {
    const url = config.webhookUrl;
    const entry = { at: new Date().toISOString(), kind, url, status: null, error: null };
    record.deliveries.push(entry);
    if (!url) {
      entry.error = "no webhook URL configured";
      return entry;
    }
    try {
      const response = await fetch(url, {
        method: "POST",
        headers: {
          "content-type": "application/json; charset=utf-8",
          "stripe-signature": signatureHeader(record.payload, config.webhookSecret),
          "user-agent": "Stripe/1.0 (+https://stripe.com/docs/webhooks)",
        },
        body: record.payload,
        redirect: "manual",
        signal: AbortSignal.timeout(10_000),
      });
      entry.status = response.status;
      entry.body = (await response.text().catch(() => "")).slice(0, 500);
    } catch (error) {
      entry.error = error?.cause?.code ?? error?.name ?? String(error);
    }
    log(`${record.event.type} ${record.event.id} → ${url}: ${entry.status ?? entry.error} (${kind})`);
    return entry;
  }

  const succeeded = (entry) => entry.status !== null && entry.status >= 200 && entry.status < 300;

  /** First attempt now; retries in the background. Resolves after the first attempt. */
  async function deliver(record) {
    const first = await attempt(record, "attempt 1");
    if (!succeeded(first) && config.webhookUrl) {
      let i = 0;
      const retry = () => {
        const delay = config.retryDelaysMs[i];
        if (delay === undefined) return;
        i += 1;
        setTimeout(async () => {
          const entry = await attempt(record, `retry ${i}`);
          if (!succeeded(entry)) retry();
        }, delay).unref?.();
      };
      retry();
    }
    return first;
  }

  return {
    /**
     * Records and posts an event whose data.object is a copy of `object`.
     * @returns {{ event: any, delivered: Promise<any> }} delivered resolves after the first attempt
     */
    emit(type, object, request = {}) {
      const event = {
        id: newId("evt", 24),
        object: "event",
        api_version: API_VERSION,
        created: now(),
        data: { object: clone(object) },
        livemode: false,
        pending_webhooks: config.webhookUrl ? 1 : 0,
        request: { id: request.id ?? null, idempotency_key: request.idempotencyKey ?? null },
        type,
      };
      const record = { event, payload: JSON.stringify(event, null, 2), deliveries: [] };
      records.set(event.id, record);
      return { event, delivered: deliver(record) };
    },
    get: (id) => records.get(id) ?? null,
    /** newest first */
    all: () => [...records.values()].reverse(),
    /** Posts an already-sent event again (same id and body, new signature), once, no retries. */
    resend: (record) => attempt(record, "resend"),
    succeeded,
  };
}
