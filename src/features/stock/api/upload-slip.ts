import { useMutation } from '@tanstack/react-query';
import { SLIP_FIELD, SLIP_MAX_BYTES, type Slip } from '@shared/schemas/bins';
import { api, ApiError } from '@/lib/api-client';

/** Refuses a file over the server's limit here, before it crawls over the hangar Wi-Fi. */
export function uploadSlip(file: File): Promise<Slip> {
  if (file.size > SLIP_MAX_BYTES) {
    return Promise.reject(new ApiError(413, 'SLIP_TOO_LARGE', 'That packing slip is larger than 10 MB. Scan or photograph it at a lower resolution.'));
  }
  const form = new FormData();
  form.append(SLIP_FIELD, file, file.name || 'packing-slip');
  return api.postForm<Slip>('/api/bins/slips', form);
}

/** A packing slip is stored on its own first; the receipt then names it by id. */
export const useUploadSlip = () => useMutation({ mutationFn: uploadSlip });

/** Where a stored slip opens (quartermaster only). */
export const slipUrl = (id: number) => `/api/bins/slips/${id}`;
