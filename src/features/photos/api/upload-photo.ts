import { useMutation } from '@tanstack/react-query';
import { PHOTO_FIELD, PHOTO_MAX_BYTES, type Photo } from '@shared/schemas/photos';
import { api, ApiError } from '@/lib/api-client';
import { shownOn } from '@/lib/query-keys';

/** Refuses a file the server would refuse anyway, before it crawls over the hangar Wi-Fi. */
export function uploadPhoto(code: string, file: File): Promise<Photo> {
  if (file.size > PHOTO_MAX_BYTES) {
    return Promise.reject(new ApiError(413, 'PHOTO_TOO_LARGE', 'That photo is larger than 10 MB. Take it again at the camera’s normal size.'));
  }
  const form = new FormData();
  form.append(PHOTO_FIELD, file, file.name || 'photo.jpg');
  return api.postForm<Photo>(`/api/tools/${encodeURIComponent(code)}/photos`, form);
}

/** Photos live in the tool's data: the tool refreshes after a change. */
export function useUploadPhoto() {
  return useMutation({ mutationFn: ({ code, file }: { code: string; file: File }) => uploadPhoto(code, file), meta: { invalidates: shownOn.toolSpec } });
}
