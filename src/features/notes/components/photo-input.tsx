import { controlClass } from '@/components/ui/field';
import { cn } from '@/components/ui/cn';

export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp';

/** A photo from the camera or the files; `id` ties it to its label. */
export function PhotoInput({
  id,
  onChange,
  describedBy,
}: {
  id: string;
  onChange: (file: File | null) => void;
  describedBy?: string;
}) {
  return (
    <input
      id={id}
      type="file"
      accept={PHOTO_ACCEPT}
      aria-describedby={describedBy}
      onChange={(e) => onChange(e.target.files?.[0] ?? null)}
      className={cn(controlClass, 'py-1.5 file:mr-3 file:rounded file:border-0 file:bg-frost')}
    />
  );
}
