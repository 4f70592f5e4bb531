// The sections of an area as a row of links under its title (Training cases, Courses, Progress).
// The current one has a bar under it, bold text and aria-current, never colour alone.
import { NavLink } from 'react-router';

export interface Section {
  to: string;
  label: string;
  /** Only this exact path marks it current (the area's first section). */
  end?: boolean;
}

export function SectionTabs({ label, sections }: { label: string; sections: readonly Section[] }) {
  return (
    <nav aria-label={label} className="border-b-2 border-line">
      <ul className="-mb-0.5 flex flex-wrap gap-x-2">
        {sections.map((section) => (
          <li key={section.to}>
            <NavLink
              to={section.to}
              end={section.end ?? false}
              className={({ isActive }) =>
                'flex min-h-touch items-center border-b-[6px] px-4 ' +
                (isActive
                  ? 'border-primary font-bold text-ink'
                  : 'border-transparent text-ink hover:bg-sunken')
              }
            >
              {section.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
