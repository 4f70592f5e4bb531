// Request shapes for /api/trees.
import { z } from 'zod';

export {
  createTreeRequestSchema,
  diffQuerySchema,
  publishDraftRequestSchema,
  regressionSetRequestSchema,
  saveDraftRequestSchema,
} from '@heatpath/contracts';

export const treeParamsSchema = z.object({
  treeId: z.uuid({ error: 'That is not a valid tree id.' }),
});
export const versionParamsSchema = treeParamsSchema.extend({
  versionId: z.uuid({ error: 'That is not a valid version id.' }),
});
export const startDraftRequestSchema = z.object({ fromVersionId: z.uuid().optional() });
