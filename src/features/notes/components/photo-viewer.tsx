import { useEffect, useRef } from 'react';
import type { Photo } from '@shared/schemas/photo';
import { Button } from '@/components/ui/button';

/** One photo at full size over the page; Escape or Close goes back. */
export function PhotoViewer({
  photo,
  label,
  onClose,
}: {
  photo: Photo;
  label: string;
  onClose: () => void;
}) {
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    close.current?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  return (
    <div
      role="dialog"
      aria-modal="true"
      aria-label={label}
      className="fixed inset-0 z-50 flex flex-col bg-ink/90 p-3 md:p-8"
      onClick={(e) => {
        if (e.target === e.currentTarget) onClose();
      }}
    >
      <div className="flex items-center justify-between gap-3 pb-3 text-paper">
        <p className="text-sm">{label}</p>
        <div className="flex items-center gap-3">
          <a href={photo.url} target="_blank" rel="noreferrer" className="text-sm underline">
            Open full size
          </a>
          <Button ref={close} onClick={onClose}>
            Close
          </Button>
        </div>
      </div>
      <img
        src={photo.url}
        alt={label}
        width={photo.width}
        height={photo.height}
        className="mx-auto min-h-0 max-w-full flex-1 object-contain"
      />
    </div>
  );
}
