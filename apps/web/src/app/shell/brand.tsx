// Heatpath's word mark: a small drawn mark (a loop with a flow arrow, for a coolant circuit) and
// the name. The mark is decoration; the link's name is the text.
import { Link } from 'react-router';

export function Brand() {
  return (
    <Link
      to="/"
      className="inline-flex min-h-touch items-center gap-2 rounded-control text-lg font-bold"
    >
      <svg aria-hidden="true" viewBox="0 0 32 32" className="size-8 shrink-0">
        <rect x="2" y="2" width="28" height="28" rx="7" className="fill-primary" />
        <path
          d="M10 21a7 7 0 1 1 12 0"
          fill="none"
          strokeWidth="3"
          strokeLinecap="round"
          className="stroke-on-primary"
        />
        <path
          d="M19 20l4 2 1-4.5"
          fill="none"
          strokeWidth="3"
          strokeLinecap="round"
          strokeLinejoin="round"
          className="stroke-on-primary"
        />
      </svg>
      <span>Heatpath</span>
    </Link>
  );
}
