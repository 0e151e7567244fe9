import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { isApiError } from '@/lib/api-client';
import { useTreePhotos } from '../api/get-tree-photos';
import { useUploadTreePhoto } from '../api/upload-photo';
import { PhotoInput } from './photo-input';
import { PhotoThumbs } from './photo-thumbs';

/** Photos of the tree itself, and adding one for whoever writes notes. */
export function TreePhotos({
  treeId,
  tag,
  canWrite,
}: {
  treeId: number;
  tag: string;
  canWrite: boolean;
}) {
  const headingId = useId();
  const inputId = useId();
  const photos = useTreePhotos(treeId);
  const upload = useUploadTreePhoto(treeId);
  const [file, setFile] = useState<File | null>(null);
  const [inputKey, setInputKey] = useState(0);

  const send = () => {
    if (!file) return;
    upload.mutate(file, {
      onSuccess: () => {
        setFile(null);
        setInputKey((k) => k + 1);
      },
    });
  };

  return (
    <section aria-labelledby={headingId}>
      <h2 id={headingId} className="text-lg font-bold">
        Photos
      </h2>
      {photos.isPending ? (
        <Skeleton className="mt-2 h-20 w-60" />
      ) : photos.isError ? (
        <ErrorState
          title="We couldn't load the photos."
          error={photos.error}
          onRetry={() => void photos.refetch()}
        />
      ) : photos.data.total === 0 ? (
        <p className="mt-1 text-bark">No photos of this tree yet.</p>
      ) : (
        <PhotoThumbs photos={photos.data.items} about={`tree ${tag}`} />
      )}
      {canWrite && (
        <div className="mt-3 flex flex-col gap-2">
          <label htmlFor={inputId} className="text-sm font-bold">
            Add a photo of the tree
          </label>
          <div className="flex flex-wrap items-center gap-3">
            <PhotoInput key={inputKey} id={inputId} onChange={setFile} />
            <Button
              variant="primary"
              disabled={!file || upload.isPending}
              aria-busy={upload.isPending || undefined}
              onClick={send}
            >
              Upload photo
            </Button>
          </div>
          {upload.isError && (
            <p role="alert" className="text-alert">
              {isApiError(upload.error) ? upload.error.message : 'The photo could not be sent.'}
            </p>
          )}
          {upload.isSuccess && (
            <p role="status" className="text-moss">
              Photo saved.
            </p>
          )}
        </div>
      )}
    </section>
  );
}
