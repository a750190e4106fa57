import { useMutation } from '@tanstack/react-query';
import type { BinImportBody, ImportResult } from '@shared/schemas/bin-import';
import { api } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** Creates every bin of the file, or none (400 IMPORT_INVALID with the problems). */
export function useCommitImport(onImported?: (result: ImportResult) => unknown) {
  return useMutation({
    mutationFn: (body: BinImportBody) => api.post<ImportResult>('/api/bins/import', body),
    onSuccess: (result) => onImported?.(result),
    meta: { invalidates: shownOn.binSpec },
  });
}
