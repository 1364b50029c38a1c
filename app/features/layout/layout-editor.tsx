// The layout editor: the plan, redrawn from the working copy as you type; outlines drawn by
// clicking on the plan (snapped to 0.1 m; close on the first point or with Finish; Escape
// cancels; Backspace takes back a point); the records grouped into levels; the selected record's
// coordinate table; the roof drawing. Save sends the whole layout with the site's version in one
// PUT; a 409 loads the layout as it now stands and keeps this copy to put back.
import { useCallback, useEffect, useMemo, useState } from "react";
import { Link, useBlocker } from "react-router";
import { Button } from "~/components/button";
import { BackdropPanel } from "./backdrop-panel";
import { itemAt, itemOfPath, itemsFromLayout, layoutFromItems, newKey, planOf, problemsOf, type LayoutItem } from "./editor-state";
import type { BackdropJson, LayoutJson } from "./json";
import { ItemPanel } from "./item-panel";
import { LevelList } from "./level-list";
import { backdropCorners, boundsOf, snap, type Bounds, type PlanFrame, type XY } from "./plan-frame";
import { SitePlan } from "./site-plan";

type Tool = "area" | "facade" | "obstruction" | "access";
type Drawing = { tool: Tool; points: XY[]; bounds: Bounds };
type Status = { tone: "ok" | "danger" | "caution"; text: string } | null;

const PLAN_WIDTH = 960;
/** A click this close (in plan pixels) to the first point closes the outline. */
const CLOSE_PX = 10;

const toolLabels: Record<Tool, string> = { area: "Draw area", facade: "Draw facade", obstruction: "Draw obstruction", access: "Place access point" };
const toolHints: Record<Tool, string> = {
  area: "Click the corners of the area. Click the first point (or Finish) to close it.",
  obstruction: "Click the corners of the obstruction. Click the first point (or Finish) to close it.",
  facade: "Click the two ends of the facade on the plan.",
  access: "Click where the door, hatch or ladder is.",
};

function newItem(tool: Tool, points: XY[], count: number, elevation: string): LayoutItem {
  const key = newKey();
  const text = (p: XY): [string, string] => [String(p[0]), String(p[1])];
  if (tool === "area") return { key, type: "area", name: `Area ${count}`, polygon: points.map(text), elevationM: elevation, access: "public" };
  if (tool === "facade") return { key, type: "facade", name: `Facade ${count}`, line: points.map(text), bottomM: "0", topM: "3", access: "public" };
  if (tool === "obstruction") return { key, type: "obstruction", name: `Obstruction ${count}`, polygon: points.map(text), baseM: elevation || "0", heightM: "2" };
  return { key, type: "access", name: `Access ${count}`, kind: "door", x: String(points[0][0]), y: String(points[0][1]), z: elevation || "0", locked: false };
}

export function LayoutEditor({ siteId, siteName, initial }: { siteId: string; siteName: string; initial: LayoutJson }) {
  const [items, setItems] = useState<LayoutItem[]>(() => itemsFromLayout(initial));
  const [version, setVersion] = useState(initial.version);
  const [backdrop, setBackdrop] = useState<BackdropJson | null>(initial.backdrop);
  const [selected, setSelected] = useState<string | null>(null);
  const [drawing, setDrawing] = useState<Drawing | null>(null);
  const [cursor, setCursor] = useState<XY | null>(null);
  const [status, setStatus] = useState<Status>(null);
  const [serverProblems, setServerProblems] = useState<Map<string, { field: string; message: string }[]>>(new Map());
  const [mine, setMine] = useState<LayoutItem[] | null>(null);
  const [saving, setSaving] = useState(false);
  const [dirty, setDirty] = useState(false);

  // Unsaved changes are not left behind by a click elsewhere or a closed tab without a question.
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (blocker.state !== "blocked") return;
    if (window.confirm("Leave the layout editor? Your unsaved changes will be lost.")) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  const plan = useMemo(() => planOf(items), [items]);
  const problems = useMemo(() => problemsOf(items), [items]);
  const problemCount = [...problems.values()].reduce((n, list) => n + list.length, 0);
  const current = items.find((i) => i.key === selected) ?? null;

  const change = (next: LayoutItem[]) => {
    setItems(next);
    setDirty(true);
    setServerProblems(new Map());
  };

  const startTool = (tool: Tool) => {
    const points: XY[] = [...plan.surfaces.flatMap((s) => (s.kind === "area" ? s.polygon : s.line ?? [])), ...plan.obstructions.flatMap((o) => o.polygon), ...plan.accessPoints.map((a): XY => [a.x, a.y]), ...(backdrop ? backdropCorners(backdrop) : [])];
    // Hold the frame still while drawing, with room around the drawing to draw beyond it.
    const b = boundsOf(points);
    const grow = Math.max(10, (b.maxX - b.minX) * 0.25, (b.maxY - b.minY) * 0.25);
    setDrawing({ tool, points: [], bounds: { minX: b.minX - grow, minY: b.minY - grow, maxX: b.maxX + grow, maxY: b.maxY + grow } });
    setStatus(null);
  };

  const finish = useCallback(
    (points: XY[]) => {
      if (!drawing) return;
      const count = items.filter((i) => i.type === drawing.tool).length + 1;
      const level = current && current.type === "area" ? current.elevationM : "0";
      const item = newItem(drawing.tool, points, count, level);
      change([...items, item]);
      setSelected(item.key);
      setDrawing(null);
    },
    [drawing, items, current],
  );

  const cancel = useCallback(() => setDrawing(null), []);

  useEffect(() => {
    if (!drawing) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === "Escape") cancel();
      if (event.key === "Backspace" && !(event.target instanceof HTMLInputElement)) {
        event.preventDefault();
        setDrawing((d) => (d ? { ...d, points: d.points.slice(0, -1) } : d));
      }
      if (event.key === "Enter" && drawing.points.length >= 3 && (drawing.tool === "area" || drawing.tool === "obstruction")) finish(drawing.points);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [drawing, cancel, finish]);

  const select = (key: string | null) => {
    setSelected(key);
    // On a narrow screen the panel sits above the list: bring it into view.
    if (key) requestAnimationFrame(() => document.getElementById("selected-record")?.scrollIntoView({ block: "nearest", behavior: "smooth" }));
  };

  const onPlanClick = (at: XY, frame: PlanFrame) => {
    if (!drawing) {
      return select(itemAt(items, at, 0.6));
    }
    const point: XY = [snap(at[0]), snap(at[1])];
    const { tool, points } = drawing;
    if (tool === "access") return finish([point]);
    if (tool === "facade") return points.length === 1 ? finish([points[0], point]) : setDrawing({ ...drawing, points: [point] });
    if (points.length >= 3) {
      const [fx, fy] = frame.toPx(...points[0]);
      const [cx, cy] = frame.toPx(...at);
      if (Math.hypot(fx - cx, fy - cy) <= CLOSE_PX) return finish(points);
    }
    setDrawing({ ...drawing, points: [...points, point] });
  };

  async function save() {
    if (problemCount) {
      setStatus({ tone: "danger", text: `Nothing is saved yet: fix ${problemCount === 1 ? "the problem" : `the ${problemCount} problems`} marked ⊠ on the records first.` });
      const first = items.find((i) => problems.has(i.key));
      if (first) setSelected(first.key);
      return;
    }
    const placement = backdrop ? { p1: backdrop.p1, p2: backdrop.p2, distanceM: backdrop.distanceM, originX: backdrop.originX, originY: backdrop.originY, rotationDeg: backdrop.rotationDeg, opacity: backdrop.opacity } : undefined;
    const { input, keys } = layoutFromItems(items, { version, backdrop: placement });
    setSaving(true);
    try {
      const response = await fetch(`/api/v1/sites/${siteId}/surfaces`, { method: "PUT", headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(input) });
      const answer = (await response.json().catch(() => null)) as (LayoutJson & { error?: { message: string; fields?: Record<string, string> }; current?: LayoutJson }) | null;
      if (response.ok && answer) {
        const keep = selected ? items.findIndex((i) => i.key === selected) : -1;
        const next = itemsFromLayout(answer);
        setItems(next);
        setVersion(answer.version);
        setBackdrop(answer.backdrop);
        setSelected(keep >= 0 ? next[keep]?.key ?? null : null);
        setDirty(false);
        setMine(null);
        setStatus({ tone: "ok", text: "Layout saved." });
      } else if (response.status === 409 && answer?.current) {
        setMine(items);
        setItems(itemsFromLayout(answer.current));
        setVersion(answer.current.version);
        setBackdrop(answer.current.backdrop);
        setSelected(null);
        setStatus({ tone: "caution", text: answer.error?.message ?? "Someone else saved this layout first." });
      } else {
        const byItem = new Map<string, { field: string; message: string }[]>();
        for (const [path, message] of Object.entries(answer?.error?.fields ?? {})) {
          const found = itemOfPath(path, keys);
          if (found) byItem.set(found.key, [...(byItem.get(found.key) ?? []), { field: found.field, message }]);
        }
        setServerProblems(byItem);
        setStatus({ tone: "danger", text: answer?.error?.message ?? `Not saved: the server answered ${response.status}.` });
      }
    } catch {
      setStatus({ tone: "danger", text: "Not saved: the connection failed. Your changes are still here; try again." });
    } finally {
      setSaving(false);
    }
  }

  const problemsFor = (key: string) => [...(problems.get(key) ?? []), ...(serverProblems.get(key) ?? [])];
  const draft = drawing ? (cursor && drawing.tool !== "access" ? [...drawing.points, [snap(cursor[0]), snap(cursor[1])] as XY] : drawing.points) : undefined;

  return (
    <div className="space-y-5">
      <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-2">
          <div role="toolbar" aria-label="Drawing tools" className="flex flex-wrap gap-2">
            {(Object.keys(toolLabels) as Tool[]).map((tool) => (
              <Button key={tool} type="button" size="sm" tone={drawing?.tool === tool ? "primary" : "secondary"} aria-pressed={drawing?.tool === tool} onClick={() => (drawing?.tool === tool ? cancel() : startTool(tool))}>
                {toolLabels[tool]}
              </Button>
            ))}
          </div>
          {drawing ? (
            <div role="status" className="flex flex-wrap items-center gap-x-3 gap-y-1 rounded-control border-l-4 border-ink-900 bg-paper px-3 py-2 text-sm">
              <span className="min-w-0 flex-1">
                {toolHints[drawing.tool]} <span className="text-graphite-600">Escape cancels; Backspace takes back a point.</span>
              </span>
              {drawing.tool === "area" || drawing.tool === "obstruction" ? (
                <Button type="button" size="sm" disabled={drawing.points.length < 3} onClick={() => finish(drawing.points)}>
                  Finish ({drawing.points.length} point{drawing.points.length === 1 ? "" : "s"})
                </Button>
              ) : null}
              <Button type="button" size="sm" tone="quiet" onClick={cancel}>
                Cancel
              </Button>
            </div>
          ) : null}
          <div data-testid="layout-plan">
            <SitePlan
              title={`Plan of ${siteName}${drawing ? ", click to add points" : ""}`}
              surfaces={plan.surfaces}
              obstructions={plan.obstructions}
              accessPoints={plan.accessPoints}
              backdrop={backdrop}
              highlightId={selected}
              draft={draft}
              bounds={drawing?.bounds}
              width={PLAN_WIDTH}
              onSiteClick={onPlanClick}
              onSiteMove={setCursor}
            />
          </div>
          <p className="h-5 text-xs text-graphite-600 tabular-nums" aria-live="off">
            {cursor ? `x ${snap(cursor[0]).toFixed(1)} m, y ${snap(cursor[1]).toFixed(1)} m` : "x east, y north, in metres from the site's origin (+)"}
          </p>
        </div>
        <aside id="selected-record" className="min-w-0 scroll-mt-4 rounded-sheet border border-rule bg-sheet p-4" aria-label="Selected record">
          {current ? (
            <ItemPanel
              key={current.key}
              item={current}
              problems={problemsFor(current.key)}
              onChange={(next) => change(items.map((i) => (i.key === next.key ? next : i)))}
              onRemove={() => {
                change(items.filter((i) => i.key !== current.key));
                setSelected(null);
              }}
            />
          ) : (
            <div className="space-y-2 text-sm text-graphite-600">
              <p className="font-medium text-ink-900">Nothing selected</p>
              <p>Pick a record from the levels below to edit its name, heights and points, or draw a new one on the plan.</p>
            </div>
          )}
        </aside>
      </div>

      <div className="grid items-start gap-5 lg:grid-cols-2">
        <section aria-labelledby="levels-title" className="min-w-0 rounded-sheet border border-rule bg-sheet p-4">
          <h3 id="levels-title" className="mb-3 text-base font-bold">
            Levels and records
          </h3>
          <LevelList items={items} selected={selected} problems={(key) => problemsFor(key).length} onSelect={select} />
        </section>
        <section aria-labelledby="backdrop-title" className="min-w-0 rounded-sheet border border-rule bg-sheet p-4">
          <h3 id="backdrop-title" className="mb-3 text-base font-bold">
            Roof drawing
          </h3>
          <BackdropPanel
            siteId={siteId}
            backdrop={backdrop}
            onChange={(next, newVersion) => {
              setBackdrop(next);
              if (newVersion !== undefined) setVersion(newVersion);
              else setDirty(true);
            }}
          />
        </section>
      </div>

      <div className="sticky bottom-0 z-10 -mx-5 flex flex-wrap items-center gap-3 border-t border-rule bg-paper/95 px-5 py-3">
        <Button type="button" disabled={saving} onClick={save}>
          {saving ? "Saving…" : "Save layout"}
        </Button>
        <Link to={`/sites/${siteId}`} className="text-sm text-graphite-600 underline hover:text-ink-900">
          {dirty ? "Leave without saving" : "Back to the site"}
        </Link>
        <span className="min-w-0 flex-1 text-sm" role="status" aria-live="polite">
          {status ? <span className={status.tone === "ok" ? "text-ok-700" : status.tone === "danger" ? "text-danger-700" : "text-caution-700"}>{status.text}</span> : problemCount ? <span className="text-danger-700">{problemCount} problem{problemCount === 1 ? "" : "s"} to fix before saving.</span> : dirty ? <span className="text-graphite-600">Unsaved changes.</span> : null}
        </span>
        {mine ? (
          <Button
            type="button"
            tone="secondary"
            size="sm"
            onClick={() => {
              setItems(mine);
              setMine(null);
              setDirty(true);
              setStatus({ tone: "caution", text: "Your version is back on the plan. Saving it now replaces the other person's layout." });
            }}
          >
            Put my version back
          </Button>
        ) : null}
      </div>
    </div>
  );
}
