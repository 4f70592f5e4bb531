// The main navigation: only the areas the signed-in role may enter. The current page is marked
// by a bar, bold text and aria-current, never by colour alone.
import type { Role } from '@heatpath/contracts';
import { NavLink } from 'react-router';
import { areaLabel, areasFor } from '../areas';

export function MainNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main">
      <ul className="flex flex-col gap-1">
        {areasFor(role).map((area) => (
          <li key={area.id}>
            <NavLink
              to={area.path}
              end={area.path === '/'}
              className={({ isActive }) =>
                'flex min-h-touch items-center justify-between gap-2 rounded-control border-l-[6px] px-3 ' +
                (isActive
                  ? 'border-primary bg-sunken font-bold text-ink'
                  : 'border-transparent font-normal text-ink hover:bg-sunken')
              }
            >
              <span>{areaLabel(area, role)}</span>
              {area.comingWith ? (
                <span className="text-sm font-normal text-ink-muted">later</span>
              ) : null}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
