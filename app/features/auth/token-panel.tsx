// API tokens on the Account page: make one (shown once), see each one's last use, revoke it.
import { useEffect, useRef } from "react";
import { useFetcher } from "react-router";
import { Button } from "~/components/button";
import { Field, FormErrors } from "~/components/field";
import { DateText } from "~/components/date-text";

export type TokenRow = { id: string; name: string; prefix: string; createdAt: Date | string; lastUsedAt: Date | string | null };
type Reply = { token?: { value: string; name: string }; tokenError?: string } | undefined;

export function TokenPanel({ tokens }: { tokens: TokenRow[] }) {
  const create = useFetcher<Reply>();
  const form = useRef<HTMLFormElement>(null);
  const made = create.data?.token;
  useEffect(() => {
    if (made) form.current?.reset();
  }, [made]);
  return (
    <div className="space-y-4">
      <p className="text-sm text-graphite-600">
        A token lets a script call the <span className="figures">/api/v1</span> API as you, with your role: send it as{" "}
        <span className="figures">Authorization: Bearer …</span>. Revoke a token you no longer use.
      </p>
      {made ? (
        <div role="status" className="rounded-control border border-ok-700/40 bg-ok-100 p-3 text-sm text-ok-700">
          <p className="font-medium">Token “{made.name}” made. Copy it now: it is not shown again.</p>
          <input readOnly value={made.value} aria-label="The new token" className="figures mt-2 w-full rounded-control border border-rule bg-sheet px-2 py-1 text-ink-900" onFocus={(e) => e.currentTarget.select()} />
        </div>
      ) : null}
      <create.Form method="post" ref={form} className="flex flex-wrap items-end gap-2">
        <input type="hidden" name="intent" value="create-token" />
        <div className="min-w-48 flex-1">
          <Field id="token-name" name="name" label="Name of a new token" hint="What will use it, e.g. “report exporter”." maxLength={80} required />
        </div>
        <Button disabled={create.state !== "idle"} className="mb-6">
          Make a token
        </Button>
      </create.Form>
      <FormErrors errors={create.data?.tokenError ? [create.data.tokenError] : null} />
      {tokens.length === 0 ? (
        <p className="text-sm text-graphite-600">You have no tokens.</p>
      ) : (
        <ul className="divide-y divide-rule text-sm">
          {tokens.map((t) => (
            <TokenItem key={t.id} token={t} />
          ))}
        </ul>
      )}
    </div>
  );
}

function TokenItem({ token }: { token: TokenRow }) {
  const revoke = useFetcher();
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-2">
      <span className="min-w-0">
        <span className="block font-medium [overflow-wrap:anywhere]">{token.name}</span>
        <span className="block text-graphite-600">
          <span className="figures">{token.prefix}…</span> · made <DateText value={token.createdAt} /> ·{" "}
          {token.lastUsedAt ? (
            <>
              last used <DateText value={token.lastUsedAt} />
            </>
          ) : (
            "never used"
          )}
        </span>
      </span>
      <revoke.Form method="post">
        <input type="hidden" name="intent" value="revoke-token" />
        <input type="hidden" name="tokenId" value={token.id} />
        <Button tone="danger" size="sm" disabled={revoke.state !== "idle"} aria-label={`Revoke the token ${token.name}`}>
          Revoke
        </Button>
      </revoke.Form>
    </li>
  );
}
