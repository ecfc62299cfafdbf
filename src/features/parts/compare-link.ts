import type { FitReportVehicle } from '@shared/schemas/fit-reports';

/** The vehicle as picked at the Counter, carried to Compare so a saved fit report names it. */
export type PickedVehicle = Pick<FitReportVehicle, 'year' | 'make' | 'model'>;

/** The Compare page's address for an original and a substitute, judged on an engine when one is known. */
export function compareHref(
  originalPartId: string,
  substitutePartId: string,
  engineId?: string | null,
  vehicle?: PickedVehicle | null,
): string {
  const params = new URLSearchParams({ original: originalPartId, substitute: substitutePartId });
  if (engineId) params.set('engine', engineId);
  if (vehicle) {
    params.set('year', String(vehicle.year));
    params.set('make', vehicle.make);
    params.set('model', vehicle.model);
  }
  return `/compare?${params}`;
}

/** The vehicle a Compare address carries, if it carries one whole. */
export function pickedVehicleOf(params: URLSearchParams): PickedVehicle | null {
  const year = Number(params.get('year'));
  const make = params.get('make')?.trim();
  const model = params.get('model')?.trim();
  return Number.isInteger(year) && year > 0 && make && model ? { year, make, model } : null;
}
