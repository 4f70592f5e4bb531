// What the lead can hide from apprentices beyond what is always hidden: the technician's notes
// (all of them, shown here so the lead sees what they are hiding) and each photo by itself, with
// its thumbnail. Customer names, contacts, the plate and the VIN never reach an apprentice.
import { Alert } from '../../../components/ui/alert';

export interface HidingNote {
  id: string;
  text: string;
}

export interface HidingPhoto {
  id: string;
  name: string;
  thumbnailUrl: string | null;
}

interface HidingChoicesProps {
  notes: readonly HidingNote[];
  photos: readonly HidingPhoto[];
  hideNotes: boolean;
  hiddenPhotoIds: readonly string[];
  onHideNotesChange: (hide: boolean) => void;
  onHiddenPhotosChange: (ids: string[]) => void;
}

export function AlwaysHiddenNote() {
  return (
    <Alert tone="info" title="Always hidden from apprentices">
      <p>
        The customer’s name and contact details, the plate and the VIN never reach an apprentice.
        You choose below whether the technician’s notes and each photo are shown too.
      </p>
    </Alert>
  );
}

export function HidingChoices({
  notes,
  photos,
  hideNotes,
  hiddenPhotoIds,
  onHideNotesChange,
  onHiddenPhotosChange,
}: HidingChoicesProps) {
  return (
    <div className="flex flex-col gap-5">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-lg font-bold">The technician’s notes</legend>
        {notes.length === 0 ? (
          <p className="text-ink-muted">This case has no notes.</p>
        ) : (
          <ul className="flex flex-col gap-1 rounded-control bg-sunken p-3">
            {notes.map((note) => (
              <li
                key={note.id}
                className={
                  'whitespace-pre-line ' + (hideNotes ? 'text-ink-muted line-through' : '')
                }
              >
                {note.text}
              </li>
            ))}
          </ul>
        )}
        <label className="flex min-h-touch cursor-pointer items-center gap-3 font-semibold">
          <input
            type="checkbox"
            className="size-6 shrink-0 accent-primary"
            checked={hideNotes}
            onChange={(event) => onHideNotesChange(event.target.checked)}
          />
          Hide the technician’s notes
        </label>
      </fieldset>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-lg font-bold">Photos</legend>
        {photos.length === 0 ? (
          <p className="text-ink-muted">This case has no photos.</p>
        ) : (
          <ul className="grid grid-cols-[repeat(auto-fill,minmax(11rem,1fr))] gap-3">
            {photos.map((photo) => {
              const hidden = hiddenPhotoIds.includes(photo.id);
              return (
                <li key={photo.id}>
                  <label
                    className={
                      'flex h-full cursor-pointer flex-col gap-2 rounded-control border-2 p-2 ' +
                      'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
                      (hidden ? 'border-line bg-sunken' : 'border-line-strong bg-surface')
                    }
                  >
                    {photo.thumbnailUrl ? (
                      <img
                        src={photo.thumbnailUrl}
                        alt=""
                        className={
                          'aspect-4/3 w-full rounded-[0.375rem] bg-sunken object-cover ' +
                          (hidden ? 'opacity-40' : '')
                        }
                      />
                    ) : (
                      <span className="flex aspect-4/3 items-center justify-center rounded-[0.375rem] bg-sunken text-sm text-ink-muted">
                        No preview
                      </span>
                    )}
                    <span className="text-sm font-semibold [overflow-wrap:anywhere]">
                      {photo.name}
                    </span>
                    <span className="flex min-h-touch items-center gap-2 font-semibold">
                      <input
                        type="checkbox"
                        className="size-6 shrink-0 accent-primary"
                        checked={hidden}
                        aria-label={`Hide this photo: ${photo.name}`}
                        onChange={() =>
                          onHiddenPhotosChange(
                            hidden
                              ? hiddenPhotoIds.filter((id) => id !== photo.id)
                              : [...hiddenPhotoIds, photo.id],
                          )
                        }
                      />
                      Hide this photo
                    </span>
                  </label>
                </li>
              );
            })}
          </ul>
        )}
      </fieldset>
    </div>
  );
}
