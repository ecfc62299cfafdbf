import { useState } from 'react';
import { formatMeasure } from '@shared/format';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Panel } from '@/components/ui/panel';
import { useEngine } from '@/features/vehicles/api/get-engine';
import { useVehicleEngines } from '@/features/vehicles/api/get-vehicle-engines';
import { useVehicleMakes } from '@/features/vehicles/api/get-vehicle-makes';
import { useVehicleModels } from '@/features/vehicles/api/get-vehicle-models';
import { useVehicleYears } from '@/features/vehicles/api/get-vehicle-years';

/** Year → make → model → engine, each list fetched as the one before it is chosen. */
function VehiclePicker({ onPick }: { onPick: (engineId: string) => void }) {
  const [year, setYear] = useState<number | null>(null);
  const [make, setMake] = useState<string | null>(null);
  const [model, setModel] = useState<string | null>(null);
  const years = useVehicleYears();
  const makes = useVehicleMakes(year);
  const models = useVehicleModels(year, make);
  const engines = useVehicleEngines(year, make, model);
  return (
    <div className="grid grid-cols-2 gap-3 md:grid-cols-4" role="group" aria-label="Vehicle">
      <SelectField
        label="Year"
        value={year ?? ''}
        onChange={(e) => {
          setYear(e.target.value ? Number(e.target.value) : null);
          setMake(null);
          setModel(null);
        }}
      >
        <option value="">{years.isPending ? 'Loading…' : 'Choose'}</option>
        {years.data?.map((y) => (
          <option key={y} value={y}>
            {y}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Make"
        value={make ?? ''}
        disabled={year === null}
        onChange={(e) => {
          setMake(e.target.value || null);
          setModel(null);
        }}
      >
        <option value="">Choose</option>
        {makes.data?.map((m) => (
          <option key={m} value={m}>
            {m}
          </option>
        ))}
      </SelectField>
      <SelectField label="Model" value={model ?? ''} disabled={make === null} onChange={(e) => setModel(e.target.value || null)}>
        <option value="">Choose</option>
        {models.data?.map((m) => (
          <option key={m} value={m}>
            {m}
          </option>
        ))}
      </SelectField>
      <SelectField label="Engine" value="" disabled={model === null} onChange={(e) => e.target.value && onPick(e.target.value)}>
        <option value="">Choose</option>
        {engines.data?.map((en) => (
          <option key={en.id} value={en.id}>
            {en.label}
          </option>
        ))}
      </SelectField>
    </div>
  );
}

/** The engine the comparison is judged on: shown with the figures that matter, or picked by vehicle. */
export function EnginePicker({
  engineId,
  error,
  onPick,
}: {
  engineId: string | null;
  error?: string | undefined;
  onPick: (engineId: string) => void;
}) {
  const [changing, setChanging] = useState(false);
  const engine = useEngine(engineId);
  const e = engine.data?.engine;
  return (
    <Panel
      title="Engine"
      actions={
        engineId && !changing ? (
          <Button variant="ghost" onClick={() => setChanging(true)} className="print:hidden">
            Change vehicle
          </Button>
        ) : null
      }
    >
      {error && (
        <p role="alert" className="mb-2 text-sm text-nogo">
          {error}
        </p>
      )}
      {engineId && !changing ? (
        <>
          {engine.isPending && <p className="text-sm text-ink-soft">Loading the engine…</p>}
          {engine.isError && <p className="text-sm text-nogo">{engine.error.message}</p>}
          {e && (
            <div className="flex flex-wrap items-baseline gap-x-6 gap-y-1">
              <p className="text-lg font-semibold text-ink" data-testid="engine-code">
                {e.code} <span className="font-normal text-ink-soft">{e.description}</span>
              </p>
              <p className="text-sm tabular-nums text-ink-soft">
                {e.compressionRatio}:1 · {e.aspiration}
                {e.peakBoostKpa > 0 ? ` ${formatMeasure(e.peakBoostKpa, 'kPa')} boost` : ''} · gap {formatMeasure(e.specGapMm, 'mm')} ·
                dwell {formatMeasure(e.dwellMs, 'ms')} running, {formatMeasure(e.crankingDwellMs, 'ms')} cranking
                {e.driverCurrentLimitA != null ? ` · driver limit ${formatMeasure(e.driverCurrentLimitA, 'A')}` : ''}
              </p>
            </div>
          )}
        </>
      ) : (
        <div className="flex flex-col gap-2">
          <VehiclePicker
            onPick={(id) => {
              setChanging(false);
              onPick(id);
            }}
          />
          {changing && (
            <div>
              <Button variant="ghost" onClick={() => setChanging(false)}>
                Keep {e?.code ?? 'the current engine'}
              </Button>
            </div>
          )}
        </div>
      )}
    </Panel>
  );
}
