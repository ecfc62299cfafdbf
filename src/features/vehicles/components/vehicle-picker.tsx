import { SelectField } from '@/components/ui/field';
import { ErrorNote } from '@/components/ui/panel';
import { useVehicleEngines } from '../api/get-vehicle-engines';
import type { VehicleEngine } from '@shared/schemas/vehicles';
import { useVehicleMakes } from '../api/get-vehicle-makes';
import { useVehicleModels } from '../api/get-vehicle-models';
import { useVehicleYears } from '../api/get-vehicle-years';

export interface VehicleChoice {
  year: number | null;
  make: string | null;
  model: string | null;
  engine: VehicleEngine | null;
}

export const NO_VEHICLE: VehicleChoice = { year: null, make: null, model: null, engine: null };

/** "2012 Varrick Halvard": the vehicle as the customer says it. */
export const vehicleName = (v: VehicleChoice): string => [v.year, v.make, v.model].filter((x) => x !== null).join(' ');

// Short enough for the narrow year select; the label already says what to choose.
function placeholder(ready: boolean, loading: boolean): string {
  if (loading) return 'loading…';
  return ready ? 'choose' : '—';
}

/**
 * Year → make → model → engine, each list asked for once the one before is chosen. Native
 * selects: the keyboard works as everywhere (type-ahead, arrows), and a change clears what
 * follows, since a make list belongs to its year.
 */
export function VehiclePicker({ value, onChange }: { value: VehicleChoice; onChange: (v: VehicleChoice) => void }) {
  const years = useVehicleYears();
  const makes = useVehicleMakes(value.year);
  const models = useVehicleModels(value.year, value.make);
  const engines = useVehicleEngines(value.year, value.make, value.model);
  const error = years.error ?? makes.error ?? models.error ?? engines.error;

  return (
    <div className="flex flex-col gap-2">
      <div className="grid grid-cols-[6rem_1fr_1fr] gap-2">
        <SelectField
          label="Year"
          value={value.year ?? ''}
          onChange={(e) => onChange({ ...NO_VEHICLE, year: e.target.value ? Number(e.target.value) : null })}
        >
          <option value="">{placeholder(true, years.isPending)}</option>
          {years.data?.map((y) => (
            <option key={y} value={y}>
              {y}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Make"
          value={value.make ?? ''}
          disabled={value.year === null}
          onChange={(e) => onChange({ ...NO_VEHICLE, year: value.year, make: e.target.value || null })}
        >
          <option value="">{placeholder(value.year !== null, makes.isFetching)}</option>
          {makes.data?.map((m) => (
            <option key={m} value={m}>
              {m}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Model"
          value={value.model ?? ''}
          disabled={value.make === null}
          onChange={(e) => onChange({ ...value, model: e.target.value || null, engine: null })}
        >
          <option value="">{placeholder(value.make !== null, models.isFetching)}</option>
          {models.data?.map((m) => (
            <option key={m} value={m}>
              {m}
            </option>
          ))}
        </SelectField>
      </div>
      <SelectField
        label="Engine"
        value={value.engine?.id ?? ''}
        disabled={value.model === null}
        onChange={(e) => onChange({ ...value, engine: engines.data?.find((en) => en.id === e.target.value) ?? null })}
      >
        <option value="">{placeholder(value.model !== null, engines.isFetching)}</option>
        {engines.data?.map((en) => (
          <option key={en.id} value={en.id}>
            {en.label}
          </option>
        ))}
      </SelectField>
      <ErrorNote error={error} />
    </div>
  );
}
