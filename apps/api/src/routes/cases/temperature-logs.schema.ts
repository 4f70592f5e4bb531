// Request shapes for /api/cases/:caseId/logs.
import { z } from 'zod';
import { caseParamsSchema } from './cases.schema';

export {
  logDetailQuerySchema,
  logMappingRequestSchema,
  logUploadFieldsSchema,
} from '@heatpath/contracts';

export const logParamsSchema = caseParamsSchema.extend({
  logId: z.uuid({ error: 'That is not a valid temperature log id.' }),
});

export const pendingUploadParamsSchema = caseParamsSchema.extend({
  pendingUploadId: z.uuid({ error: 'That is not a valid upload id.' }),
});
