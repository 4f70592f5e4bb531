// Which of the case's photos go into the repair order: real checkboxes over the thumbnails, in
// the order they were ticked, which is the order they print in.
import type { RepairOrderPhoto } from '@heatpath/contracts';
import { FieldError } from '../../../components/ui/field';

interface PhotoPickerProps {
  photos: readonly RepairOrderPhoto[];
  chosen: readonly string[];
  limit: number;
  error?: string | undefined;
  onChange: (chosen: string[]) => void;
}

export function PhotoPicker({ photos, chosen, limit, error, onChange }: PhotoPickerProps) {
  const full = chosen.length >= limit;
  return (
    <fieldset className="flex flex-col gap-3" aria-describedby="photo-picker-hint">
      <legend className="mb-2 text-lg font-bold">Photos for the repair order</legend>
      <p id="photo-picker-hint" className="text-sm text-ink-muted">
        {photos.length === 0
          ? 'This case has no photos.'
          : `Tick up to ${limit}. They print in the order you tick them; ${chosen.length} chosen.`}
      </p>
      {photos.length > 0 ? (
        <ul className="grid grid-cols-2 gap-3 @2xl:grid-cols-3">
          {photos.map((photo) => {
            const at = chosen.indexOf(photo.id);
            const checked = at !== -1;
            return (
              <li key={photo.id}>
                <label
                  className={
                    'flex h-full cursor-pointer flex-col gap-2 rounded-control border-2 p-2 ' +
                    'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
                    (checked ? 'border-primary bg-sunken' : 'border-line-strong bg-surface')
                  }
                >
                  {photo.thumbnailUrl ? (
                    <img
                      src={photo.thumbnailUrl}
                      alt=""
                      className="aspect-4/3 w-full rounded-[0.375rem] bg-sunken object-cover"
                    />
                  ) : (
                    <span className="flex aspect-4/3 items-center justify-center rounded-[0.375rem] bg-sunken text-sm text-ink-muted">
                      No preview
                    </span>
                  )}
                  <span className="flex min-h-touch items-start gap-2">
                    <input
                      type="checkbox"
                      className="mt-1 size-6 shrink-0 accent-primary"
                      checked={checked}
                      disabled={!checked && full}
                      onChange={() =>
                        onChange(
                          checked ? chosen.filter((id) => id !== photo.id) : [...chosen, photo.id],
                        )
                      }
                    />
                    <span className="flex min-w-0 flex-col">
                      <span className="font-semibold [overflow-wrap:anywhere]">
                        {checked ? `${at + 1}. ` : ''}
                        {photo.name}
                      </span>
                      {photo.stepTitle ? (
                        <span className="text-sm text-ink-muted">{photo.stepTitle}</span>
                      ) : null}
                    </span>
                  </span>
                </label>
              </li>
            );
          })}
        </ul>
      ) : null}
      {error ? <FieldError id="photo-picker-error" message={error} /> : null}
    </fieldset>
  );
}
