import { z } from 'zod';
import type { LocationBody, UpdateLocationBody } from '../../shared/schemas/locations';
import { insertReturningId, queryOne, queryRows, type Executor } from '../db/executor';

const locationRowSchema = z.object({
  id: z.string(),
  name: z.string(),
  address: z.string(),
  phone: z.string(),
  opening_hours: z.string(),
});
export type LocationRow = z.infer<typeof locationRowSchema>;

const COLUMNS = 'id, name, address, phone, opening_hours';
/** The chain's order: the first store opened first. "The first store" is the head of this order. */
const ORDER = 'created_at, name';

export function listLocations(ex: Executor): Promise<LocationRow[]> {
  return queryRows(ex, locationRowSchema, `SELECT ${COLUMNS} FROM location ORDER BY ${ORDER}`);
}

export function findLocation(ex: Executor, id: string): Promise<LocationRow | null> {
  return queryOne(ex, locationRowSchema, `SELECT ${COLUMNS} FROM location WHERE id = $1`, [id]);
}

export async function firstLocationId(ex: Executor): Promise<string | null> {
  return (await queryOne(ex, locationRowSchema, `SELECT ${COLUMNS} FROM location ORDER BY ${ORDER} LIMIT 1`))?.id ?? null;
}

export function insertLocation(ex: Executor, body: LocationBody): Promise<string> {
  return insertReturningId(ex, `INSERT INTO location (name, address, phone, opening_hours) VALUES ($1,$2,$3,$4) RETURNING id`, [
    body.name,
    body.address,
    body.phone,
    body.openingHours,
  ]);
}

/** Only the fields given change. */
export function updateLocation(ex: Executor, id: string, body: UpdateLocationBody): Promise<LocationRow | null> {
  return queryOne(
    ex,
    locationRowSchema,
    `UPDATE location SET name = coalesce($2, name), address = coalesce($3, address), phone = coalesce($4, phone),
            opening_hours = coalesce($5, opening_hours)
      WHERE id = $1 RETURNING ${COLUMNS}`,
    [id, body.name ?? null, body.address ?? null, body.phone ?? null, body.openingHours ?? null],
  );
}
