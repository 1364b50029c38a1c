// The layout's records as people think of them: levels (areas grouped by elevation, highest
// first), then facades, obstructions and access points. Selectable in the editor, plain text on
// the site page.
import type { ReactNode } from "react";
import { elevationLabel, levelsOf, num, type LayoutItem } from "./editor-state";
import { accessLabels } from "./schemas";

type Props = { items: LayoutItem[]; selected?: string | null; problems?: (key: string) => number; onSelect?: (key: string) => void };

function detail(item: LayoutItem) {
  const m = (v: string) => (Number.isFinite(num(v)) ? `${num(v)} m` : "?");
  switch (item.type) {
    case "area":
      return `${item.polygon.length} points · ${accessLabels[item.access]}`;
    case "facade":
      return `${m(item.bottomM)} to ${m(item.topM)} · ${accessLabels[item.access]}`;
    case "obstruction":
      return `${m(item.heightM)} high from ${m(item.baseM)}`;
    case "access":
      return `${item.kind} at (${item.x}, ${item.y}), z ${m(item.z)}${item.locked ? " · locked" : ""}`;
  }
}

function Row({ item, selected, problems, onSelect }: { item: LayoutItem } & Omit<Props, "items">) {
  const count = problems?.(item.key) ?? 0;
  const body = (
    <>
      <span className="block min-w-0 truncate font-medium text-ink-900">
        {item.name || "(no name)"}
        {count ? <span className="ml-2 text-xs font-medium text-danger-700">⊠ {count} problem{count === 1 ? "" : "s"}</span> : null}
      </span>
      <span className="block truncate text-xs text-graphite-600">{detail(item)}</span>
    </>
  );
  return (
    <li>
      {onSelect ? (
        <button type="button" aria-current={selected === item.key ? "true" : undefined} onClick={() => onSelect(item.key)} className={`block w-full rounded-control px-2 py-1.5 text-left text-sm hover:bg-paper ${selected === item.key ? "bg-paper ring-1 ring-ink-900" : ""}`}>
          {body}
        </button>
      ) : (
        <div className="px-2 py-1.5 text-sm">{body}</div>
      )}
    </li>
  );
}

function Group({ title, children }: { title: ReactNode; children: ReactNode }) {
  return (
    <div>
      <h4 className="label-caps border-b border-rule pb-1 text-graphite-600">{title}</h4>
      <ul className="mt-1 space-y-0.5">{children}</ul>
    </div>
  );
}

export function LevelList({ items, ...rest }: Props) {
  const levels = levelsOf(items);
  const others = (["facade", "obstruction", "access"] as const).map((type) => ({ type, items: items.filter((i) => i.type === type) }));
  const titles = { facade: "Facades", obstruction: "Obstructions", access: "Access points" } as const;
  if (items.length === 0) return <p className="text-sm text-graphite-600">No areas, facades, obstructions or access points yet.</p>;
  return (
    <div className="space-y-4" data-testid="level-list">
      {levels.map((level) => (
        <Group key={level.elevation} title={<>Level {elevationLabel(level.elevation)}</>}>
          {level.items.map((item) => (
            <Row key={item.key} item={item} {...rest} />
          ))}
        </Group>
      ))}
      {others.map((group) =>
        group.items.length ? (
          <Group key={group.type} title={titles[group.type]}>
            {group.items.map((item) => (
              <Row key={item.key} item={item} {...rest} />
            ))}
          </Group>
        ) : null,
      )}
    </div>
  );
}
