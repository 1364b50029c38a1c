// A visit's photos as a grid of upright thumbnails, each opening its own page.
import { Link } from "react-router";

type Photo = { id: string; caption: string; fileName: string; thumbFileId: string; widthPx: number; heightPx: number; latitude: number | null };

export function PhotoGrid({ photos, basePath }: { photos: Photo[]; basePath: string }) {
  if (photos.length === 0) return <p className="text-sm text-graphite-600">No photos yet.</p>;
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
      {photos.map((p) => (
        <li key={p.id}>
          <Link to={`${basePath}/photos/${p.id}`} className="group block overflow-hidden rounded-control border border-rule bg-white hover:border-rule-strong">
            <img
              src={`/files/${p.thumbFileId}`}
              alt={p.caption || `Photo ${p.fileName}`}
              width={p.widthPx}
              height={p.heightPx}
              loading="lazy"
              className="aspect-[4/3] w-full bg-paper-deep object-cover"
            />
            <span className="block truncate px-2 py-1.5 text-xs text-ink-700 group-hover:text-ink-900">{p.caption || <span className="text-graphite-500">{p.fileName}</span>}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
