import { queryOptions } from '@tanstack/react-query';
import type { BinReorder } from '@shared/schemas/bins';
import { api } from '@/lib/api-client';
import { binKeys } from './keys';

/** What the one reorder rule says of one bin now: read beside the scan answer, which leaves it out to stay fast. */
export const binReorderQueryOptions = (code: string) =>
  queryOptions({
    queryKey: binKeys.reorder(code),
    queryFn: () => api.get<BinReorder>(`/api/bins/${encodeURIComponent(code)}/reorder`),
  });
