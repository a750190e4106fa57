import { useState } from 'react';
import type { Photo } from '@shared/schemas/photos';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useUploadPhoto } from '../api/upload-photo';
import { PhotoFileInput } from './photo-file-input';

/**
 * An optional photo while returning a tool that needs attention. The photo is uploaded at once;
 * its id goes into the return (undefined when the person leaves it out).
 */
export function ReturnPhotoPicker({ code, onUploaded }: { code: string; onUploaded: (photoId: number | undefined) => void }) {
  const upload = useUploadPhoto();
  const [photo, setPhoto] = useState<Photo>();
  const [problem, setProblem] = useState<string>();

  const addPhoto = (file: File) => {
    setProblem(undefined);
    upload.mutate(
      { code, file },
      {
        onSuccess: (p) => {
          setPhoto(p);
          onUploaded(p.id);
        },
        onError: (err) => setProblem(messageOf(err)),
      },
    );
  };

  const leaveOut = () => {
    setPhoto(undefined);
    onUploaded(undefined);
  };

  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-semibold">Photo of the problem (optional)</legend>
      <p className="text-sm text-steel">A picture shows the quartermaster what to look at.</p>
      {photo && (
        <div className="flex flex-wrap items-center gap-3">
          <img src={photo.thumbnailUrl} alt={`Your photo of ${code}`} className="size-24 rounded-lg border border-rule object-cover" />
          <p className="font-medium">Photo attached to the return.</p>
          <Button variant="quiet" onClick={leaveOut}>
            Leave the photo out
          </Button>
        </div>
      )}
      {problem && <Notice tone="bad">{problem}</Notice>}
      <PhotoFileInput label={photo ? 'Take another photo' : 'Add photo'} busy={upload.isPending} onFile={addPhoto} />
    </fieldset>
  );
}
