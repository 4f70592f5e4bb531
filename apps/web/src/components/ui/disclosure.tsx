// A section that can be folded away: a heading whose button says whether it is open. Used for
// long lists a person looks at now and then (the path so far, the history), never for anything
// safety-related, which is always shown.
import { useId, useState, type ReactNode } from 'react';

interface DisclosureProps {
  title: string;
  /** Shown after the title, such as a count ("5 steps"). */
  summary?: ReactNode;
  defaultOpen?: boolean;
  /** Called with the new state, e.g. to fetch the content only once it is opened. */
  onToggle?: (open: boolean) => void;
  children: ReactNode;
}

export function Disclosure({
  title,
  summary,
  defaultOpen = false,
  onToggle,
  children,
}: DisclosureProps) {
  const [open, setOpen] = useState(defaultOpen);
  const contentId = useId();
  return (
    <section className="rounded-panel border-2 border-line bg-surface">
      <h2 className="text-lg font-bold">
        <button
          type="button"
          aria-expanded={open}
          aria-controls={contentId}
          onClick={() => {
            setOpen(!open);
            onToggle?.(!open);
          }}
          className="flex min-h-touch w-full items-center justify-between gap-3 rounded-panel px-4 py-2 text-left hover:bg-sunken sm:px-6"
        >
          <span className="flex flex-wrap items-baseline gap-x-3">
            <span>{title}</span>
            {summary ? <span className="text-sm font-normal text-ink-muted">{summary}</span> : null}
          </span>
          <span aria-hidden="true" className="text-base">
            {open ? '▲' : '▼'}
          </span>
        </button>
      </h2>
      <div id={contentId} hidden={!open} className="border-t-2 border-line p-4 sm:p-6">
        {open ? children : null}
      </div>
    </section>
  );
}
