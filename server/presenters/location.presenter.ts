import type {
  Location,
  LocationResponse,
  LocationsResponse,
  Transfer,
  TransferResponse,
  TransfersResponse,
} from '../../shared/schemas/locations';
import type { LocationRow } from '../repositories/locations.repository';
import type { TransferRow } from '../repositories/transfers.repository';
import { stepsFor, type Reader } from '../services/transfers.service';

export const presentLocation = (r: LocationRow): Location => ({
  id: r.id,
  name: r.name,
  address: r.address,
  phone: r.phone,
  openingHours: r.opening_hours,
});

export const presentLocations = (rows: LocationRow[]): LocationsResponse => ({ locations: rows.map(presentLocation) });
export const presentLocationResponse = (r: LocationRow): LocationResponse => ({ location: presentLocation(r) });

/** A transfer with the steps this reader may take on it now. */
export function presentTransfer(t: TransferRow, reader: Reader): Transfer {
  return {
    id: t.id,
    partId: t.part_id,
    partNumber: t.part_number,
    brand: t.brand,
    from: { id: t.from_location_id, name: t.from_name },
    to: { id: t.to_location_id, name: t.to_name },
    quantity: t.quantity,
    state: t.state,
    refusalReason: t.refusal_reason,
    requestedBy: t.requester_name,
    createdAt: t.created_at.toISOString(),
    updatedAt: t.updated_at.toISOString(),
    steps: stepsFor(t, reader),
  };
}

export const presentTransfers = (r: { rows: TransferRow[]; total: number }, reader: Reader): TransfersResponse => ({
  transfers: r.rows.map((t) => presentTransfer(t, reader)),
  total: r.total,
});
export const presentTransferResponse = (t: TransferRow, reader: Reader): TransferResponse => ({ transfer: presentTransfer(t, reader) });
