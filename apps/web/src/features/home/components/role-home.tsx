// The home screen for each role: who is signed in, and the areas that role works in, with the
// ones not built yet shown as such rather than as dead buttons.
import { roleLabels, type Me, type Role } from '@heatpath/contracts';
import { Link } from 'react-router';
import { SafetyNote } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { PageHeader } from '../../../components/ui/page';

export interface HomeArea {
  id: string;
  path: string;
  label: string;
  summary: string;
  comingWith?: string;
}

const intros: Record<Role, string> = {
  lead: 'Run the workshop’s diagnosis: the people, the order of checks, the cases and the training.',
  technician: 'Work at the car: your cases, their guided checks, and the figures you need.',
  apprentice: 'Learn from the workshop’s finished cases and practise the figures.',
  advisor: 'Pass findings on to the repair order and the customer.',
};

// People who stand at a hot engine see the one caution that matters before anything else.
const showsCoolingCaution: readonly Role[] = ['technician', 'apprentice', 'lead'];

export function RoleHome({ me, areas }: { me: Me; areas: readonly HomeArea[] }) {
  const ready = areas.filter((area) => !area.comingWith);
  const later = areas.filter((area) => area.comingWith);
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title={`Hello, ${me.name}`}
        lead={
          <>
            <p>
              {roleLabels[me.role]} at {me.workshop.name}.
            </p>
            <p>{intros[me.role]}</p>
          </>
        }
      />

      {showsCoolingCaution.includes(me.role) ? (
        <SafetyNote>
          <p>
            Never open a hot cooling system: it is under pressure and the coolant can scald. Let it
            cool before you open the cap, and keep clear of the fan — it can start on its own.
          </p>
        </SafetyNote>
      ) : null}

      <section aria-labelledby="ready-heading" className="flex flex-col gap-3">
        <h2 id="ready-heading" className="text-xl font-bold">
          Ready to use
        </h2>
        <ul className="grid gap-3 lg:grid-cols-2">
          {ready.map((area) => (
            <li key={area.id}>
              <Link
                to={area.path}
                className="flex h-full min-h-24 flex-col gap-1 rounded-panel border-2 border-line-strong bg-surface p-4 hover:bg-sunken"
              >
                <span className="flex items-center justify-between gap-2 text-lg font-bold">
                  {area.label}
                  <span aria-hidden="true">→</span>
                </span>
                <span className="text-ink-muted">{area.summary}</span>
              </Link>
            </li>
          ))}
        </ul>
      </section>

      {later.length > 0 ? (
        <section aria-labelledby="later-heading" className="flex flex-col gap-3">
          <h2 id="later-heading" className="text-xl font-bold">
            Coming later
          </h2>
          <ul className="grid gap-3 lg:grid-cols-2">
            {later.map((area) => (
              <li
                key={area.id}
                className="flex flex-col gap-2 rounded-panel border-2 border-dashed border-line-strong p-4"
              >
                <span className="text-lg font-bold">{area.label}</span>
                <span className="text-ink-muted">{area.summary}</span>
                <span>
                  <Badge tone="later">Coming with {area.comingWith}</Badge>
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
