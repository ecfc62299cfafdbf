import type { Engine } from '@shared/schemas/vehicles';
import { formatMeasure, formatNumber, UNITS } from '@shared/format';

/** The engine figures a substitute is judged against, on one line. */
export function EngineSummary({ engine }: { engine: Engine }) {
  const facts = [
    engine.description,
    `${engine.cylinders} cyl`,
    `compression ${formatNumber(engine.compressionRatio, 1)}:1`,
    engine.aspiration === 'natural'
      ? 'naturally aspirated'
      : `${engine.aspiration}, ${formatMeasure(engine.peakBoostKpa, UNITS.kpa, 0)} peak boost`,
    `${formatMeasure(engine.systemVoltage, UNITS.volt, 1)} system`,
    `dwell ${formatMeasure(engine.dwellMs, UNITS.ms, 1)} (cranking ${formatMeasure(engine.crankingDwellMs, UNITS.ms, 1)})`,
    engine.driverCurrentLimitA != null ? `driver limit ${formatMeasure(engine.driverCurrentLimitA, UNITS.amp, 1)}` : null,
    `spec gap ${formatMeasure(engine.specGapMm, UNITS.mm)}`,
  ].filter((f) => f !== null);
  return <p className="text-sm text-ink-soft">{facts.join(' · ')}</p>;
}
