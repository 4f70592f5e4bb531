// Role choices for the staff screens, in the order a lead thinks of the team.
import { roleLabels, roles } from '@heatpath/contracts';
import type { SelectOption } from '../../../components/ui/field';

export const roleOptions: readonly SelectOption[] = roles.map((role) => ({
  value: role,
  label: roleLabels[role],
}));
