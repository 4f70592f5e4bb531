// Cases as the API takes and returns them: intake, the list with keyset pages, and the case.
import { z } from 'zod';
import { personRefSchema, timestampSchema } from './person';
import { customerInputSchema, customerSchema, distanceUnits, vehicleSchema } from './vehicles';

export const caseStatuses = ['open', 'in_diagnosis', 'diagnosed', 'closed'] as const;
export type CaseStatus = (typeof caseStatuses)[number];
export const caseStatusLabels: Record<CaseStatus, string> = {
  open: 'Open',
  in_diagnosis: 'In diagnosis',
  diagnosed: 'Diagnosed',
  closed: 'Closed',
};

export const createCaseRequestSchema = z
  .object({
    vehicleId: z.uuid({ error: 'Choose or add the vehicle.' }),
    customerId: z.uuid().nullish(),
    newCustomer: customerInputSchema.nullish(),
    complaint: z
      .string({ error: 'Write down the complaint in the customer’s words.' })
      .trim()
      .min(3, 'Write down the complaint in the customer’s words.')
      .max(2000, 'Keep the complaint under 2000 characters.'),
    mileageAtIntake: z.coerce
      .number()
      .int()
      .min(0, 'Mileage cannot be negative.')
      .max(3_000_000)
      .nullish(),
    mileageUnit: z.enum(distanceUnits).default('km'),
    treeId: z.uuid({ error: 'Choose the symptom to start from.' }),
    assignedTo: z.uuid().nullish(),
  })
  .refine((v) => !(v.customerId && v.newCustomer), {
    message: 'Choose an existing customer or enter a new one, not both.',
    path: ['newCustomer'],
  });
export type CreateCaseRequest = z.infer<typeof createCaseRequestSchema>;

export const caseListQuerySchema = z.object({
  scope: z.enum(['mine', 'workshop']).default('workshop'),
  status: z.enum(caseStatuses).optional(),
  technicianId: z.uuid().optional(),
  q: z.string().trim().max(60).optional(),
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});
export type CaseListQuery = z.infer<typeof caseListQuerySchema>;

/** What a case list screen filters by: the query without its paging (the web app's list key). */
export const caseListFiltersSchema = caseListQuerySchema
  .pick({
    status: true,
    technicianId: true,
    q: true,
  })
  .extend({ scope: z.enum(['mine', 'workshop']) });
export type CaseListFilters = z.infer<typeof caseListFiltersSchema>;

export const caseSummarySchema = z.object({
  id: z.uuid(),
  number: z.number(),
  reference: z.string(),
  status: z.enum(caseStatuses),
  complaint: z.string(),
  symptom: z.string(),
  vehicle: z.object({
    id: z.uuid(),
    plate: z.string().nullable(),
    vin: z.string().nullable(),
    make: z.string(),
    model: z.string(),
    year: z.number().nullable(),
  }),
  customerName: z.string().nullable(),
  assignee: personRefSchema.nullable(),
  currentStepTitle: z.string().nullable(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type CaseSummary = z.infer<typeof caseSummarySchema>;

export const caseListSchema = z.object({
  cases: z.array(caseSummarySchema),
  nextCursor: z.string().nullable(),
});
export type CaseList = z.infer<typeof caseListSchema>;

export const treeVersionRefSchema = z.object({
  id: z.uuid(),
  treeId: z.uuid(),
  version: z.number(),
  title: z.string(),
  status: z.enum(['draft', 'published', 'retired']),
});

export const availableTreeSchema = z.object({
  id: z.uuid(),
  key: z.string(),
  title: z.string(),
  symptom: z.string(),
  latestPublished: z.object({ id: z.uuid(), version: z.number() }).nullable(),
});
export type AvailableTree = z.infer<typeof availableTreeSchema>;
/** GET /api/trees/available */
export const availableTreeListSchema = z.object({ trees: z.array(availableTreeSchema) });
export type AvailableTreeList = z.infer<typeof availableTreeListSchema>;

export { customerSchema, personRefSchema, vehicleSchema };
