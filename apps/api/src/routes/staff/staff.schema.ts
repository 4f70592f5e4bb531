// Request shapes for /api/staff.
import { z } from 'zod';

export {
  createStaffRequestSchema,
  inviteStaffRequestSchema,
  updateStaffRequestSchema,
} from '@heatpath/contracts';

export const staffParamsSchema = z.object({
  userId: z.uuid({ error: 'That is not a valid staff member id.' }),
});
