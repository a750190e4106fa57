import { useState } from 'react';
import { photoThumbnailUrl } from '@shared/schemas/photos';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useDeletePhoto } from '../api/delete-photo';
import { useUploadPhoto } from '../api/upload-photo';
import { PhotoFileInput } from './photo-file-input';
import { PhotoViewer } from './photo-viewer';

export interface ToolPhotosProps {
  code: string;
  photoIds: number[];
  /** Quartermaster or lead, or the member who has the tool on loan. */
  canUpload: boolean;
  /** Quartermaster or lead. */
  canDelete?: boolean;
  /** After a photo is added or removed, so the page can refresh the tool and its history. */
  onChange?: () => void;
}

type Message = { tone: 'ok' | 'bad'; text: string };

/** Thumbnails of a tool's photos; a tap opens the full photo. Shows new photos at once, before the tool refreshes. */
export function ToolPhotos({ code, photoIds, canUpload, canDelete = false, onChange }: ToolPhotosProps) {
  const upload = useUploadPhoto();
  const remove = useDeletePhoto();
  const [added, setAdded] = useState<number[]>([]);
  const [removed, setRemoved] = useState<number[]>([]);
  const [openId, setOpenId] = useState<number>();
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<Message>();
  const ids = [...new Set([...photoIds, ...added])].filter((id) => !removed.includes(id));
  const place = (id: number) => `${ids.indexOf(id) + 1} of ${ids.length} of ${code}`;

  const addPhoto = (file: File) => {
    setMessage(undefined);
    upload.mutate(
      { code, file },
      {
        onSuccess: (photo) => {
          setAdded((a) => [...a, photo.id]);
          setMessage({ tone: 'ok', text: 'Photo added.' });
          onChange?.();
        },
        onError: (err) => setMessage({ tone: 'bad', text: messageOf(err) }),
      },
    );
  };

  const removePhoto = (id: number) =>
    remove.mutate(id, {
      onSuccess: () => {
        setRemoved((r) => [...r, id]);
        setOpenId(undefined);
        setMessage({ tone: 'ok', text: 'Photo removed.' });
        onChange?.();
      },
      onError: (err) => setMessage({ tone: 'bad', text: messageOf(err) }),
      onSettled: () => setConfirming(false),
    });

  const close = () => {
    setOpenId(undefined);
    setConfirming(false);
  };

  return (
    <div className="flex flex-col gap-3">
      {ids.length === 0 ? (
        <p className="text-steel">No photos of {code} yet.</p>
      ) : (
        <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
          {ids.map((id) => (
            <li key={id}>
              <button
                type="button"
                onClick={() => setOpenId(id)}
                aria-label={`Open photo ${place(id)}`}
                className="block aspect-square w-full overflow-hidden rounded-lg border border-rule bg-paper"
              >
                <img src={photoThumbnailUrl(id)} alt="" loading="lazy" className="size-full object-cover" />
              </button>
            </li>
          ))}
        </ul>
      )}
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      {canUpload && <PhotoFileInput label="Add photo" busy={upload.isPending} onFile={addPhoto} />}
      {openId !== undefined && (
        <PhotoViewer
          id={openId}
          title={`Photo ${place(openId)}`}
          onClose={close}
          actions={
            canDelete &&
            (confirming ? (
              <>
                <Button variant="danger" busy={remove.isPending} onClick={() => removePhoto(openId)}>
                  Confirm remove
                </Button>
                <Button variant="secondary" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </>
            ) : (
              <Button variant="danger" onClick={() => setConfirming(true)}>
                Remove photo
              </Button>
            ))
          }
        />
      )}
    </div>
  );
}
