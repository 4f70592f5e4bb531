// The list of calculators: large targets, one per line on a phone.
import { Link } from 'react-router';
import { calculatorIds, calculators } from '../calculators';

export function CalculatorIndex() {
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {calculatorIds.map((id) => (
        <li key={id}>
          <Link
            to={id}
            className="flex h-full min-h-24 flex-col gap-1 rounded-panel border-2 border-line-strong bg-surface p-4 hover:bg-sunken"
          >
            <span className="flex items-center justify-between gap-2 text-lg font-bold">
              {calculators[id].title}
              <span aria-hidden="true">→</span>
            </span>
            <span className="text-ink-muted">{calculators[id].summary}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
