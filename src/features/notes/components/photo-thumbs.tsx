import { useState } from 'react';
import type { Photo } from '@shared/schemas/photo';
import { formatDate } from '@/lib/units';
import { PhotoViewer } from './photo-viewer';

/** Thumbnails that open the full image; `about` names what they show ("the note", "tree 0412"). */
export function PhotoThumbs({ photos, about }: { photos: readonly Photo[]; about: string }) {
  const [open, setOpen] = useState<Photo | null>(null);
  if (photos.length === 0) return null;
  const labelOf = (p: Photo, i: number) => `Photo ${i + 1} of ${about}, ${formatDate(p.createdAt)}`;
  return (
    <>
      <ul aria-label={`Photos of ${about}`} className="mt-2 flex flex-wrap gap-2">
        {photos.map((p, i) => (
          <li key={p.id}>
            <button
              type="button"
              onClick={() => setOpen(p)}
              className="block overflow-hidden rounded border border-rule hover:border-bark focus-visible:outline focus-visible:outline-2 focus-visible:outline-sap"
            >
              <img
                src={p.thumbUrl}
                alt={labelOf(p, i)}
                loading="lazy"
                className="size-20 object-cover md:size-24"
              />
            </button>
          </li>
        ))}
      </ul>
      {open && (
        <PhotoViewer
          photo={open}
          label={labelOf(open, photos.indexOf(open))}
          onClose={() => setOpen(null)}
        />
      )}
    </>
  );
}
