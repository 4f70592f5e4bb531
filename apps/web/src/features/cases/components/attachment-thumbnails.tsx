// Thumbnails of attached photos and tiles for other files; each opens the full file. The images
// come from the API with the session cookie, like any same-origin image.
import type { CaseAttachment } from '@heatpath/contracts';

export function AttachmentThumbnails({
  attachments,
  captionFor,
}: {
  attachments: readonly CaseAttachment[];
  /** A line under each, such as the step it belongs to. */
  captionFor?: (attachment: CaseAttachment) => string | null;
}) {
  if (attachments.length === 0) return null;
  return (
    <ul className="grid grid-cols-[repeat(auto-fill,minmax(8.5rem,1fr))] gap-3">
      {attachments.map((attachment) => {
        const caption = captionFor?.(attachment);
        return (
          <li key={attachment.id}>
            <a
              href={attachment.url}
              target="_blank"
              rel="noopener"
              className="flex h-full flex-col gap-1 rounded-control border-2 border-line-strong bg-surface p-1.5 hover:bg-sunken"
            >
              {attachment.thumbnailUrl ? (
                <img
                  src={attachment.thumbnailUrl}
                  alt={attachment.name}
                  loading="lazy"
                  className="aspect-square w-full rounded-[0.375rem] bg-sunken object-cover"
                />
              ) : (
                <span className="flex aspect-square w-full items-center justify-center rounded-[0.375rem] bg-sunken text-lg font-bold">
                  {attachment.kind === 'log'
                    ? 'Log'
                    : attachment.kind === 'photo'
                      ? 'Photo'
                      : 'File'}
                </span>
              )}
              <span className="truncate text-sm" title={attachment.name}>
                {attachment.thumbnailUrl ? <span className="sr-only">Open </span> : null}
                {attachment.name}
              </span>
              {caption ? <span className="truncate text-sm text-ink-muted">{caption}</span> : null}
            </a>
          </li>
        );
      })}
    </ul>
  );
}
