// The areas of Heatpath, who may enter each, and whether it is built yet. The navigation, the
// home screens and the route guards all read this one list, so a role never sees a link to a
// screen that would turn it away.
import type { Role } from '@heatpath/contracts';

export type AreaId =
  | 'home'
  | 'staff'
  | 'trees'
  | 'cases'
  | 'training'
  | 'casebook'
  | 'findings'
  | 'outbox'
  | 'calculators';

export interface Area {
  id: AreaId;
  path: string;
  /** Label in the navigation; a role may see its own wording ("My cases"). */
  label: string;
  labelFor?: Partial<Record<Role, string>>;
  roles: readonly Role[];
  /**
   * Roles that may open this area's records by link without the area in their navigation: the
   * service advisor opens a case page from Findings.
   */
  readers?: readonly Role[];
  /** What this area is for, as the home screen explains it to each role. */
  summary: Partial<Record<Role, string>>;
  /** Set while the capability behind this area is not built; its screen is a placeholder. */
  comingWith?: string;
}

const everyone: readonly Role[] = ['lead', 'technician', 'apprentice', 'advisor'];

export const areas: readonly Area[] = [
  {
    id: 'home',
    path: '/',
    label: 'Home',
    roles: everyone,
    summary: {},
  },
  {
    id: 'staff',
    path: '/staff',
    label: 'Staff',
    roles: ['lead'],
    summary: {
      lead: 'Add people to the workshop, set their role and first password, or deactivate them.',
    },
  },
  {
    id: 'trees',
    path: '/trees',
    label: 'Decision trees',
    roles: ['lead'],
    summary: {
      lead: 'Write the order of checks once, test a change against solved cases, then publish it.',
    },
  },
  {
    id: 'cases',
    path: '/cases',
    label: 'Cases',
    labelFor: { technician: 'My cases' },
    roles: ['lead', 'technician'],
    readers: ['advisor'],
    summary: {
      lead: 'Review the workshop’s open and finished cases and the findings they reached.',
      technician:
        'Open a case for a vehicle, answer the guided checks, record readings and reach a finding.',
    },
  },
  {
    id: 'training',
    path: '/training',
    label: 'Training',
    roles: ['lead'],
    summary: {
      lead: 'Choose finished cases for apprentices to replay, build courses, and sign off their progress.',
    },
  },
  {
    id: 'casebook',
    path: '/casebook',
    label: 'Casebook',
    roles: ['apprentice'],
    // The lead opens training cases by link from Training, to see them as an apprentice does.
    readers: ['lead'],
    summary: {
      apprentice:
        'Replay finished cases step by step, predict the next check, and see how you scored.',
    },
  },
  {
    id: 'findings',
    path: '/findings',
    label: 'Findings',
    roles: ['advisor'],
    // The lead reviews and approves repair orders too, from a case's page.
    readers: ['lead'],
    summary: {
      advisor:
        'Review the findings of diagnosed cases for the repair order, approve them, download them as PDF, CSV or JSON and e-mail them.',
    },
  },
  {
    id: 'outbox',
    path: '/outbox',
    label: 'Outbox',
    roles: ['lead'],
    summary: {
      lead: 'Every e-mail Heatpath wrote — repair orders, invitations, password resets — as it was sent, with its status.',
    },
  },
  {
    id: 'calculators',
    path: '/calculators',
    label: 'Calculators',
    roles: everyone,
    summary: {
      lead: 'Coolant protection, mix adjustment, boiling margin, temperature drop, pressure test and heat flow.',
      technician:
        'At the car: coolant protection, mix, boiling margin, temperature drop, pressure test, heat flow.',
      apprentice: 'Work the same figures the technicians use, with where each one comes from.',
      advisor: 'Check a figure before you explain it to a customer.',
    },
  },
];

export function areasFor(role: Role): Area[] {
  return areas.filter((area) => area.roles.includes(role));
}

export function areaLabel(area: Area, role: Role): string {
  return area.labelFor?.[role] ?? area.label;
}

/** Whether a role may open one of the area's records (a case page), in its navigation or not. */
export function mayRead(area: Area, role: Role): boolean {
  return area.roles.includes(role) || (area.readers?.includes(role) ?? false);
}

export function getArea(id: AreaId): Area {
  const area = areas.find((candidate) => candidate.id === id);
  if (!area) throw new Error(`Unknown area ${id}`);
  return area;
}
