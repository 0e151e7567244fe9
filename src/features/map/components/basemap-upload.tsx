import { useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { formatNumber } from '@/lib/units';
import { useUploadBasemap } from '../api/upload-basemap';
import type { Basemap } from '@shared/schemas/map';

/** Sends a raster MBTiles file to the server, with a progress bar and the server's refusal. */
export function BasemapUpload({
  sugarbushId,
  onUploaded,
}: {
  sugarbushId: number;
  onUploaded: (basemap: Basemap) => void;
}) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadBasemap(sugarbushId);
  const [done, setDone] = useState<string | null>(null);

  const send = (file: File) => {
    setDone(null);
    // No name sent: the server takes the one inside the file, else the file's own name.
    upload.mutate(
      { file },
      {
        onSuccess: (basemap) => {
          setDone(`Uploaded ${basemap.name}.`);
          onUploaded(basemap);
        },
      },
    );
  };

  return (
    <div className="flex flex-col gap-2">
      <input
        ref={input}
        type="file"
        accept=".mbtiles,application/vnd.sqlite3,application/x-sqlite3"
        aria-label="MBTiles file"
        className="sr-only"
        tabIndex={-1}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) send(file);
        }}
      />
      <div>
        <Button onClick={() => input.current?.click()} disabled={upload.isPending}>
          Upload MBTiles
        </Button>
      </div>
      {upload.isPending && (
        <div className="flex items-center gap-2 text-sm">
          <progress
            aria-label="Upload progress"
            max={1}
            value={upload.progress ?? undefined}
            className="h-2 w-48 accent-sap"
          />
          <span className="tabular-nums">
            {upload.progress === null ? 'Sending…' : `${formatNumber(upload.progress * 100)} %`}
          </span>
        </div>
      )}
      {upload.isError && (
        <p role="alert" className="text-sm text-alert">
          The basemap was not added: {upload.error.message}
        </p>
      )}
      {done && (
        <p role="status" className="text-sm text-moss">
          {done}
        </p>
      )}
    </div>
  );
}
