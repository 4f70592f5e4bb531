// Photos in the outbox, shown from their own bytes the moment they are taken, marked as waiting
// to be sent (or refused, with the server's words, in the answer status).
import { usePhotoUrl, type PhotoItem } from '../../../lib/outbox';

export function QueuedPhotos({ photos }: { photos: readonly PhotoItem[] }) {
  if (photos.length === 0) return null;
  return (
    <ul className="grid grid-cols-[repeat(auto-fill,minmax(8.5rem,1fr))] gap-3">
      {photos.map((photo) => (
        <QueuedPhoto key={photo.seq} photo={photo} />
      ))}
    </ul>
  );
}

function QueuedPhoto({ photo }: { photo: PhotoItem }) {
  const url = usePhotoUrl(photo);
  return (
    <li className="flex h-full flex-col gap-1 rounded-control border-2 border-dashed border-line-strong bg-surface p-1.5">
      {url ? (
        <img
          src={url}
          alt={photo.name}
          className="aspect-square w-full rounded-[0.375rem] bg-sunken object-cover"
        />
      ) : (
        <span className="flex aspect-square w-full items-center justify-center rounded-[0.375rem] bg-sunken text-lg font-bold">
          Photo
        </span>
      )}
      <span className="truncate text-sm" title={photo.name}>
        {photo.name}
      </span>
      <span className="text-sm text-ink-muted">
        {photo.state === 'refused' ? 'Not accepted' : 'Waiting to send'}
      </span>
    </li>
  );
}
