// The "add a reading" form under the table. After each reading it starts afresh, keeping what
// the next reading most likely shares: the surface, the height, the unit, the standard, tier and frequency.
import { useCallback, useState } from "react";
import { ReadingForm, type ReadingDefaults } from "./reading-form";

const carried = ["surfaceId", "heightM", "unit", "standard", "tier", "frequencyMHz"] as const;

export function AddReading({ surfaces }: { surfaces: { id: string; name: string }[] }) {
  const [round, setRound] = useState(0);
  const [defaults, setDefaults] = useState<ReadingDefaults>({});
  const next = useCallback((sent: Record<string, unknown>) => {
    setDefaults(Object.fromEntries(carried.filter((k) => typeof sent[k] === "string" && sent[k] !== "").map((k) => [k, sent[k]])) as ReadingDefaults);
    setRound((n) => n + 1);
  }, []);
  return (
    <>
      <ReadingForm key={round} intent="add-reading" formId={`add-reading-${round}`} surfaces={surfaces} defaults={defaults} submitLabel="Add reading" onDone={next} />
      {round > 0 ? <p className="mt-2 text-xs text-graphite-600">Reading added. The next one starts with the same surface, height, unit and frequency.</p> : null}
    </>
  );
}
