import { useState } from 'react';
import type { FitReportBody } from '@shared/schemas/fit-reports';
import { fieldErrorsOf } from '@/components/ui/field-errors';
import { Button } from '@/components/ui/button';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useCompareCoils } from '@/features/compare/api/compare-coils';
import { useComparePlugs } from '@/features/compare/api/compare-plugs';
import { ComparisonOutcome } from '@/features/compare/components/comparison-outcome';
import { EnginePicker } from '@/features/compare/components/engine-picker';
import { KindToggle } from '@/features/compare/components/kind-toggle';
import { SidePicker } from '@/features/compare/components/side-picker';
import { useCompareSelection } from '@/features/compare/use-compare-selection';
import { SaveFitReportForm } from '@/features/fit-reports/components/save-fit-report-form';

/** Compare: an original against a substitute on an engine, row by row, with both charts. */
export function ComparePage() {
  const sel = useCompareSelection();
  // A typed-in spec edited since it was used: the verdict on screen no longer belongs to it.
  const [editedOriginal, setEditedOriginal] = useState(false);
  const [editedSubstitute, setEditedSubstitute] = useState(false);
  const outOfDate = editedOriginal || editedSubstitute;
  const request = sel.request;
  const coil = useCompareCoils(request?.kind === 'coil' ? request.body : null);
  const plug = useComparePlugs(request?.kind === 'plug' ? request.body : null);
  const query = request?.kind === 'plug' ? plug : coil;
  const error = request ? query.error : null;
  const errors = {
    original: fieldErrorsOf(error, 'original'),
    substitute: fieldErrorsOf(error, 'substitute'),
    engine: fieldErrorsOf(error, 'engine'),
  };
  const shownBySide = Object.values(errors).some((e) => Object.keys(e).length > 0);
  const report: FitReportBody | null = request
    ? request.kind === 'coil'
      ? { kind: 'coil', inputs: request.body }
      : { kind: 'plug', inputs: request.body }
    : null;
  const result = request && !query.isPlaceholderData && !outOfDate ? query.data : undefined;

  return (
    <>
      <PageHeader title="Compare">
        <KindToggle kind={sel.kind} onChange={sel.setKind} />
      </PageHeader>
      <div className="flex flex-col gap-4">
        <EnginePicker engineId={sel.engineId} error={errors.engine.engineId ?? errors.engine['']} onPick={sel.setEngine} />
        <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-4 lg:grid-cols-2">
          <SidePicker
            key={`original-${sel.kind}`}
            title="Original"
            kind={sel.kind}
            partId={sel.originalPartId}
            typed={sel.typedOriginal}
            fittedPartId={sel.fittedPartId}
            errors={errors.original}
            onPickPart={(id) => sel.pickPart('original', id)}
            onTypeSpec={(t) => sel.typeSpec('original', t)}
            onClearSpec={() => sel.clearSpec('original')}
            onOutOfDate={setEditedOriginal}
          />
          <SidePicker
            key={`substitute-${sel.kind}`}
            title="Substitute"
            kind={sel.kind}
            partId={sel.substitutePartId}
            typed={sel.typedSubstitute}
            startFrom={sel.originalSpec}
            errors={errors.substitute}
            onPickPart={(id) => sel.pickPart('substitute', id)}
            onTypeSpec={(t) => sel.typeSpec('substitute', t)}
            onClearSpec={() => sel.clearSpec('substitute')}
            onOutOfDate={setEditedSubstitute}
          />
        </div>
        {sel.canSwap && (
          <div className="-mt-2 flex justify-center print:hidden">
            <Button variant="ghost" onClick={sel.swap}>
              ⇄ Swap original and substitute
            </Button>
          </div>
        )}
        <ComparisonOutcome
          ready={request !== null}
          outOfDate={outOfDate}
          pending={query.isFetching && !result}
          error={error}
          errorShownBySide={shownBySide}
          result={result}
        />
        {result && report && (
          <Panel title="Keep this comparison" className="print:hidden">
            <SaveFitReportForm request={report} />
          </Panel>
        )}
      </div>
    </>
  );
}
