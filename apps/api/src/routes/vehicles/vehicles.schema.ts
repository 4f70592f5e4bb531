// Request shapes for /api/vehicles.
import { z } from 'zod';

export { vehicleInputSchema, vehicleLookupQuerySchema } from '@heatpath/contracts';

export const vehicleParamsSchema = z.object({
  vehicleId: z.uuid({ error: 'That is not a valid vehicle id.' }),
});
