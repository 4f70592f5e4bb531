// Vehicles and customers as the API takes and returns them.
import { z } from 'zod';
import { checkVin, normaliseVin } from './vin';

export const fuelKinds = ['petrol', 'diesel', 'hybrid', 'plug-in-hybrid', 'lpg', 'other'] as const;
export const fuelLabels: Record<(typeof fuelKinds)[number], string> = {
  petrol: 'Petrol',
  diesel: 'Diesel',
  hybrid: 'Hybrid',
  'plug-in-hybrid': 'Plug-in hybrid',
  lpg: 'LPG',
  other: 'Other',
};
export const distanceUnits = ['km', 'mi'] as const;

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, `${label} can have at most ${max} characters.`)
    .transform((v) => (v === '' ? null : v))
    .nullish();

export const vinSchema = z
  .string()
  .transform(normaliseVin)
  .superRefine((vin, ctx) => {
    const check = checkVin(vin);
    if (check.problem) ctx.addIssue({ code: 'custom', message: check.problem });
  });

export const customerInputSchema = z.object({
  name: z
    .string({ error: 'Enter the customer’s name.' })
    .trim()
    .min(1, 'Enter the customer’s name.')
    .max(120),
  phone: optionalText(40, 'A phone number'),
  email: z
    .union([z.literal(''), z.email({ error: 'Enter a valid e-mail address.' })])
    .transform((v) => (v === '' ? null : v))
    .nullish(),
});
export type CustomerInput = z.infer<typeof customerInputSchema>;

export const customerSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  phone: z.string().nullable(),
  email: z.string().nullable(),
});
export type Customer = z.infer<typeof customerSchema>;

const currentYear = new Date().getFullYear();

export const vehicleInputSchema = z
  .object({
    vin: z
      .union([z.literal(''), vinSchema])
      .transform((v) => (v === '' ? null : v))
      .nullish(),
    plate: optionalText(16, 'A plate'),
    make: z.string({ error: 'Enter the make.' }).trim().min(1, 'Enter the make.').max(60),
    model: z.string({ error: 'Enter the model.' }).trim().min(1, 'Enter the model.').max(60),
    year: z.coerce
      .number()
      .int('Enter the year as a whole number.')
      .min(1950, 'Heatpath takes model years from 1950.')
      .max(currentYear + 1, `The model year cannot be after ${currentYear + 1}.`)
      .nullish(),
    engine: optionalText(80, 'The engine'),
    fuel: z.enum(fuelKinds, { error: 'Choose a fuel.' }).nullish(),
    mileage: z.coerce
      .number()
      .int('Enter the mileage as a whole number.')
      .min(0, 'Mileage cannot be negative.')
      .max(3_000_000)
      .nullish(),
    mileageUnit: z.enum(distanceUnits).default('km'),
    customerId: z.uuid().nullish(),
  })
  .refine((v) => Boolean(v.vin) || Boolean(v.plate), {
    message: 'Enter the VIN or the registration plate so the vehicle can be found again.',
    path: ['plate'],
  });
export type VehicleInput = z.infer<typeof vehicleInputSchema>;

export const vehicleSchema = z.object({
  id: z.uuid(),
  vin: z.string().nullable(),
  vinWarning: z.string().nullable(),
  plate: z.string().nullable(),
  make: z.string(),
  model: z.string(),
  year: z.number().nullable(),
  engine: z.string().nullable(),
  fuel: z.enum(fuelKinds).nullable(),
  mileage: z.number().nullable(),
  mileageUnit: z.enum(distanceUnits),
  customer: customerSchema.nullable(),
});
export type Vehicle = z.infer<typeof vehicleSchema>;

export const vehicleLookupQuerySchema = z.object({
  q: z.string().trim().min(2, 'Type at least two characters of the plate or VIN.').max(40),
});

export const vehicleListSchema = z.object({ vehicles: z.array(vehicleSchema) });
export const customerListSchema = z.object({ customers: z.array(customerSchema) });

/** Plates compared without spaces, dashes or letter case. */
export const plateKey = (plate: string): string => plate.replace(/[\s-]/g, '').toUpperCase();
