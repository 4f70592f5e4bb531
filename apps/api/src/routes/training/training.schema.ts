// Request shapes for /api/training.
import { z } from 'zod';

export {
  courseRequestSchema,
  markTrainingCaseRequestSchema,
  predictionRequestSchema,
  signOffRequestSchema,
  updateTrainingCaseRequestSchema,
} from '@heatpath/contracts';

export const trainingCaseParamsSchema = z.object({
  trainingCaseId: z.uuid({ error: 'That is not a valid training case id.' }),
});

export const trainingPhotoParamsSchema = trainingCaseParamsSchema.extend({
  attachmentId: z.uuid({ error: 'That is not a valid photo id.' }),
  which: z.enum(['file', 'thumbnail'], { error: 'Ask for the file or the thumbnail.' }),
});

export const courseParamsSchema = z.object({
  courseId: z.uuid({ error: 'That is not a valid course id.' }),
});

export const attemptParamsSchema = z.object({
  attemptId: z.uuid({ error: 'That is not a valid attempt id.' }),
});

export const apprenticeParamsSchema = z.object({
  apprenticeId: z.uuid({ error: 'That is not a valid apprentice id.' }),
});
