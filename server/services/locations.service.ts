import type { DataSource } from 'typeorm';
import type { User } from '../../shared/schemas/auth';
import type { LocationBody, UpdateLocationBody } from '../../shared/schemas/locations';
import type { Executor } from '../db/executor';
import { AppError } from '../errors';
import { audit } from '../repositories/audit.repository';
import {
  findLocation,
  firstLocationId,
  insertLocation,
  listLocations,
  updateLocation,
  type LocationRow,
} from '../repositories/locations.repository';

export const getLocations = (ds: DataSource): Promise<LocationRow[]> => listLocations(ds.manager);

/**
 * Which store is "here" for a reader: a person's home store; for anyone without one (an API key,
 * a shop's technician) the store named by the `location` query parameter, else the chain's first
 * store (the one opened first).
 */
/** "Here" for a request, worked out on the executor the read runs on. */
export type Here = (ex: Executor) => Promise<string | null>;

export const hereFor =
  (user: Pick<User, 'homeLocationId'> | undefined, requested?: string): Here =>
  (ex) =>
    resolveHere(ex, user, requested);

export async function resolveHere(
  ex: Executor,
  user: Pick<User, 'homeLocationId'> | undefined,
  requested?: string,
): Promise<string | null> {
  if (user?.homeLocationId) return user.homeLocationId;
  if (requested) {
    if (!(await findLocation(ex, requested))) throw AppError.badRequest('location: no such store');
    return requested;
  }
  return firstLocationId(ex);
}

export function createLocation(ds: DataSource, actorId: string, body: LocationBody): Promise<LocationRow> {
  return ds.transaction(async (m) => {
    const id = await insertLocation(m, body);
    await audit(m, { actorId, action: 'location.create', entityType: 'location', entityId: id, data: { ...body } });
    const row = await findLocation(m, id);
    if (!row) throw AppError.notFound('Store');
    return row;
  });
}

export function editLocation(ds: DataSource, actorId: string, id: string, body: UpdateLocationBody): Promise<LocationRow> {
  return ds.transaction(async (m) => {
    const row = await updateLocation(m, id, body);
    if (!row) throw AppError.notFound('Store');
    await audit(m, { actorId, action: 'location.update', entityType: 'location', entityId: id, data: { ...body } });
    return row;
  });
}
