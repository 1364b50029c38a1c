// Uploads the chosen photos one request each to POST /api/v1/visits/:id/photos (so each is
// held to the 10 MB limit on its own and reports its own result), then reloads the page data.
import { useRef, useState, type FormEvent } from "react";
import { useRevalidator } from "react-router";
import { Button } from "~/components/button";
import { PHOTO_MAX_BYTES } from "./limits";

type Result = { name: string; ok: boolean; message: string };

async function uploadOne(visitId: string, file: File, caption: string): Promise<Result> {
  if (file.size > PHOTO_MAX_BYTES) return { name: file.name, ok: false, message: `larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB; upload a smaller copy.` };
  const body = new FormData();
  body.append("photo", file);
  if (caption) body.append("caption", caption);
  try {
    const response = await fetch(`/api/v1/visits/${visitId}/photos`, { method: "POST", body, headers: { accept: "application/json" } });
    if (response.ok) return { name: file.name, ok: true, message: "added." };
    const answer = (await response.json().catch(() => null)) as { error?: { message?: string } } | null;
    return { name: file.name, ok: false, message: answer?.error?.message ?? `not added (the server answered ${response.status}).` };
  } catch {
    return { name: file.name, ok: false, message: "not added: the connection failed. Try again." };
  }
}

export function PhotoUploader({ visitId }: { visitId: string }) {
  const revalidator = useRevalidator();
  const input = useRef<HTMLInputElement>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [results, setResults] = useState<Result[]>([]);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const files = [...(input.current?.files ?? [])];
    const caption = String(new FormData(form).get("caption") ?? "").trim();
    if (files.length === 0) return setResults([{ name: "", ok: false, message: "Choose one or more photos first." }]);
    const done: Result[] = [];
    for (const [i, file] of files.entries()) {
      setBusy(`Uploading ${i + 1} of ${files.length}…`);
      done.push(await uploadOne(visitId, file, caption));
    }
    setBusy(null);
    setResults(done);
    if (done.some((r) => r.ok)) form.reset();
    await revalidator.revalidate();
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3 rounded-control border border-dashed border-rule bg-paper p-3" aria-label="Add photos">
      <div className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <div>
          <label htmlFor="photo-files" className="mb-1 block text-sm font-medium text-ink-700">
            Photos
          </label>
          <input ref={input} id="photo-files" name="photo" type="file" accept="image/jpeg,image/png,image/webp" multiple className="block w-full text-sm text-ink-700 file:mr-3 file:rounded-control file:border-0 file:bg-white file:px-3 file:py-2 file:text-sm file:font-medium file:ring-1 file:ring-rule" />
          <p className="mt-1 text-xs text-graphite-600">JPEG, PNG or WebP, up to 10 MB each.</p>
        </div>
        <div>
          <label htmlFor="photo-caption" className="mb-1 block text-sm font-medium text-ink-700">
            Caption
          </label>
          <input id="photo-caption" name="caption" type="text" maxLength={300} placeholder="e.g. North sector, panels A1–A3" className="block w-full rounded-control border border-rule bg-white px-3 py-2 text-sm" />
          <p className="mt-1 text-xs text-graphite-600">Given to every photo of this upload; change it on each photo later.</p>
        </div>
        <Button disabled={busy !== null}>{busy ?? "Upload"}</Button>
      </div>
      {results.length ? (
        <ul role="status" className="space-y-0.5 text-sm">
          {results.map((r, i) => (
            <li key={`${r.name}-${i}`} className={r.ok ? "text-ok-700" : "text-danger-700"}>
              {r.name ? <span className="font-medium break-all">{r.name}: </span> : null}
              {r.message}
            </li>
          ))}
        </ul>
      ) : null}
    </form>
  );
}
