import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  IMPORT_ID_HEADER,
  type ImportKind,
  type ImportMapping,
  type ImportResult,
} from '@shared/schemas/imports';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-roots';

export interface ImportRequest {
  kind: ImportKind;
  file: File;
  mapping: ImportMapping;
  /** Check only: the answer reports every row and nothing is written. */
  dryRun: boolean;
  /** A random id under which the server keeps this import's steps (`useImportProgress`). */
  importId: string;
  /** Bytes of the upload sent, of all. */
  onUpload?: (sent: number, total: number) => void;
}

export const importFile = (sugarbushId: number, r: ImportRequest) => {
  const form = new FormData();
  form.append('mapping', JSON.stringify(r.mapping));
  form.append('file', r.file);
  return api.postForm<ImportResult>(
    `/sugarbushes/${sugarbushId}/imports/${r.kind}${r.dryRun ? '?dryRun=1' : ''}`,
    form,
    {
      headers: { [IMPORT_ID_HEADER]: r.importId },
      onUploadProgress: r.onUpload ?? (() => undefined),
    },
  );
};

/** Check or import a file; an import that wrote rows refreshes everything the stand shows. */
export function useImportFile(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (r: ImportRequest) => importFile(sugarbushId, r),
    onSuccess: async (result) => {
      if (result.dryRun || result.created + result.updated === 0) return;
      await Promise.all(
        Object.values(queryRoots).map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}
