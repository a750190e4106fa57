import { useMutation } from '@tanstack/react-query';
import type { BinImportBody, ImportPreview } from '@shared/schemas/bin-import';
import { api } from '@/lib/api-client';

/** Checks a bins CSV row by row on the server; creates nothing. */
export function usePreviewImport() {
  return useMutation({
    mutationFn: (body: BinImportBody) => api.post<ImportPreview>('/api/bins/import/preview', body),
  });
}
