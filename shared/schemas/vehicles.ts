import { z } from 'zod';
import { uuidSchema } from './common';
import { partSummarySchema, priceSchema, stockViewSchema } from './parts';
import { engineSpecSchema, partSpecSchema } from './specs';
import { text } from './text';

/** The vehicle picker (year → make → model → engine) and an engine with its fitted parts. */

// ---------- requests ----------

const yearSchema = z.coerce.number().int().min(1900).max(2100);
const vehicleNameSchema = text({ min: 1, max: 80 });

export const vehicleMakesQuerySchema = z.object({ year: yearSchema });
export const vehicleModelsQuerySchema = z.object({ year: yearSchema, make: vehicleNameSchema });
export const vehicleEnginesQuerySchema = z.object({ year: yearSchema, make: vehicleNameSchema, model: vehicleNameSchema });

// ---------- responses ----------

export const vehicleYearsResponseSchema = z.object({ years: z.array(z.number().int()) });
export type VehicleYearsResponse = z.infer<typeof vehicleYearsResponseSchema>;

export const vehicleMakesResponseSchema = z.object({ makes: z.array(z.string()) });
export type VehicleMakesResponse = z.infer<typeof vehicleMakesResponseSchema>;

export const vehicleModelsResponseSchema = z.object({ models: z.array(z.string()) });
export type VehicleModelsResponse = z.infer<typeof vehicleModelsResponseSchema>;

/** An engine offered for the year, make and model picked, labelled with its trims. */
export const vehicleEngineSchema = z.object({ id: uuidSchema, code: z.string(), label: z.string() });
export type VehicleEngine = z.infer<typeof vehicleEngineSchema>;

export const vehicleEnginesResponseSchema = z.object({ engines: z.array(vehicleEngineSchema) });
export type VehicleEnginesResponse = z.infer<typeof vehicleEnginesResponseSchema>;

export const engineSchema = engineSpecSchema
  .extend({ id: uuidSchema, description: z.string(), systemVoltage: z.number() })
  .meta({ id: 'Engine' });
export type Engine = z.infer<typeof engineSchema>;

export const FITMENT_POSITIONS = ['ignition coil', 'spark plug'] as const;

export const fitmentSchema = z.object({
  part: partSummarySchema,
  spec: partSpecSchema.nullable(),
  position: z.enum(FITMENT_POSITIONS),
  quantity: z.number().int(),
  stock: stockViewSchema,
  price: priceSchema.nullable(),
});
export type Fitment = z.infer<typeof fitmentSchema>;

/** GET /api/engines/:id. */
export const engineDetailSchema = z.object({ engine: engineSchema, fitments: z.array(fitmentSchema) });
export type EngineDetail = z.infer<typeof engineDetailSchema>;
