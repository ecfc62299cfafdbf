import { createColumnHelper } from '@tanstack/react-table';
import { createContext, useContext, useId, useRef, useState } from 'react';
import { HEAT_STEP_MAX, HEAT_STEP_MIN } from '@shared/schemas/specs';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';
import { fillRun, HEAT_STEPS, newHeatRow, rowsAsCodes, type HeatRow, type RowErrors } from '../heat-table';
import { HeatScale } from './heat-scale';

const CELL =
  'w-full rounded-md border bg-paper-raised px-2 py-1 text-[15px] text-ink placeholder:text-ink-faint focus:border-accent aria-invalid:border-nogo';

const stepLabel = (s: number) => (s === HEAT_STEP_MIN ? `${s} · hottest` : s === HEAT_STEP_MAX ? `${s} · coldest` : String(s));

/** Fills the table from a run of codes: the usual way a brand numbers its heat ranges. */
function RunFiller({ onFill }: { onFill: (rows: HeatRow[]) => void }) {
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [firstStep, setFirstStep] = useState('');
  const [nextIs, setNextIs] = useState<'colder' | 'hotter'>('colder');
  const [message, setMessage] = useState<string | null>(null);
  const id = useId();
  const fill = () => {
    if (firstStep === '') {
      setMessage('choose the heat step of the first code');
      return;
    }
    const r = fillRun({ from, to, firstStep: Number(firstStep), nextIs });
    if (r.ok) {
      setMessage(null);
      onFill(r.rows);
    } else setMessage(r.message);
  };
  return (
    <fieldset
      className="flex flex-col gap-1.5 rounded-md border border-dashed border-ink/20 px-3 py-2"
      onKeyDown={(e) => {
        // Enter here fills the run; it must not submit the brand form around it.
        if (e.key === 'Enter' && e.target instanceof HTMLInputElement) {
          e.preventDefault();
          fill();
        }
      }}
    >
      <legend className="px-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Fill a run</legend>
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1.5 text-[15px] text-ink">
        <label htmlFor={`${id}-from`}>Codes</label>
        <input
          id={`${id}-from`}
          aria-label="Run from code"
          className={`${CELL} !w-14 border-ink/20`}
          value={from}
          onChange={(e) => setFrom(e.target.value)}
        />
        <label htmlFor={`${id}-to`}>to</label>
        <input
          id={`${id}-to`}
          aria-label="Run to code"
          className={`${CELL} !w-14 border-ink/20`}
          value={to}
          onChange={(e) => setTo(e.target.value)}
        />
        <label htmlFor={`${id}-step`}>; the first is step</label>
        <select
          id={`${id}-step`}
          aria-label="Heat step of the first code"
          className={`${CELL} !w-auto border-ink/20`}
          value={firstStep}
          onChange={(e) => setFirstStep(e.target.value)}
        >
          <option value="">—</option>
          {HEAT_STEPS.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </select>
        <label htmlFor={`${id}-dir`}>and each next code is</label>
        <select
          id={`${id}-dir`}
          aria-label="Each next code is"
          className={`${CELL} !w-auto border-ink/20`}
          value={nextIs}
          onChange={(e) => setNextIs(e.target.value === 'hotter' ? 'hotter' : 'colder')}
        >
          <option value="colder">one step colder</option>
          <option value="hotter">one step hotter</option>
        </select>
        <Button variant="secondary" onClick={fill}>
          Fill
        </Button>
      </div>
      {message && (
        <p role="alert" className="text-sm text-nogo">
          {message}
        </p>
      )}
      <p className="text-xs text-ink-faint">Replaces the rows below. Numbers (2 to 9) or single letters (R to X).</p>
    </fieldset>
  );
}

/** A row of the table as its cells see it: the row, where it stands and what is wrong with it. */
interface HeatLine {
  row: HeatRow;
  index: number;
  errors: RowErrors;
}

// The cells' handlers change with every keystroke; a context hands them over so that the
// columns (and the inputs in them) keep their identity and the focus stays where it is typed.
const HeatRowActions = createContext<{
  update: (key: number, patch: Partial<HeatRow>) => void;
  remove: (key: number) => void;
  /** Enter in a code: the next row's code, or a new row after the last. */
  next: (index: number) => void;
}>({ update: () => {}, remove: () => {}, next: () => {} });

function CodeCell({ line: { row: r, index: i, errors: e } }: { line: HeatLine }) {
  const { update, next } = useContext(HeatRowActions);
  return (
    <>
      <input
        data-code
        aria-label={`Heat code, row ${i + 1}`}
        aria-invalid={e.code ? true : undefined}
        maxLength={20}
        className={`${CELL} border-ink/20 font-mono`}
        value={r.code}
        onChange={(ev) => update(r.key, { code: ev.target.value })}
        onKeyDown={(ev) => {
          if (ev.key === 'Enter') {
            ev.preventDefault();
            next(i);
          }
        }}
      />
      {e.code && <p className="text-xs text-nogo">{e.code}</p>}
    </>
  );
}

function StepCell({ line: { row: r, index: i, errors: e } }: { line: HeatLine }) {
  const { update } = useContext(HeatRowActions);
  return (
    <>
      <select
        aria-label={`Heat step, row ${i + 1}`}
        aria-invalid={e.step ? true : undefined}
        className={`${CELL} border-ink/20`}
        value={r.step}
        onChange={(ev) => update(r.key, { step: ev.target.value })}
      >
        <option value="">—</option>
        {HEAT_STEPS.map((s) => (
          <option key={s} value={s}>
            {stepLabel(s)}
          </option>
        ))}
      </select>
      {e.step && <p className="text-xs text-nogo">{e.step}</p>}
    </>
  );
}

function RemoveCell({ line: { row: r, index: i } }: { line: HeatLine }) {
  const { remove } = useContext(HeatRowActions);
  return (
    <Button variant="ghost" aria-label={`Remove row ${i + 1}`} onClick={() => remove(r.key)}>
      Remove
    </Button>
  );
}

const col = createColumnHelper<HeatLine>();
const COLUMNS = [
  col.display({ id: 'code', header: 'Heat code', cell: (c) => <CodeCell line={c.row.original} />, meta: { cellClassName: 'w-[45%]' } }),
  col.display({ id: 'step', header: 'Heat step', cell: (c) => <StepCell line={c.row.original} /> }),
  col.display({
    id: 'remove',
    header: () => <span className="sr-only">Remove</span>,
    cell: (c) => <RemoveCell line={c.row.original} />,
    meta: { align: 'right' },
  }),
];

/**
 * A brand's heat table: each of its heat codes and the heat step it stands for, typed row by row
 * or filled from a run, with the scale drawn as it is typed. Enter in a code adds the next row.
 */
export function HeatTableEditor({
  rows,
  errors,
  tableError,
  onChange,
}: {
  rows: readonly HeatRow[];
  errors: Record<number, RowErrors>;
  tableError: string | null;
  onChange: (rows: HeatRow[]) => void;
}) {
  const list = useRef<HTMLDivElement>(null);
  const focusCode = (index: number) =>
    requestAnimationFrame(() => list.current?.querySelectorAll<HTMLInputElement>('input[data-code]')[index]?.focus());
  const update = (key: number, patch: Partial<HeatRow>) => onChange(rows.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const add = () => {
    // The next code usually sits one step colder than the last.
    const last = rows[rows.length - 1];
    const step = last && last.step !== '' && Number(last.step) < HEAT_STEP_MAX ? String(Number(last.step) + 1) : '';
    onChange([...rows, newHeatRow('', step)]);
    focusCode(rows.length);
  };
  const remove = (key: number) => onChange(rows.filter((r) => r.key !== key));
  const next = (index: number) => (index === rows.length - 1 ? add() : focusCode(index + 1));
  const lines = rows.map((row, index) => ({ row, index, errors: errors[row.key] ?? {} }));

  return (
    <div className="flex flex-col gap-3">
      <RunFiller onFill={onChange} />
      {rows.length > 0 ? (
        <div ref={list}>
          <HeatRowActions.Provider value={{ update, remove, next }}>
            <DataTable label="Heat codes" data={lines} columns={COLUMNS} getRowId={(l) => String(l.row.key)} compact />
          </HeatRowActions.Provider>
        </div>
      ) : (
        <p className="text-sm text-ink-soft">
          No heat codes yet. A coil-only brand needs none; a plug brand needs one per heat range it sells.
        </p>
      )}
      {tableError && (
        <p role="alert" className="text-sm text-nogo">
          {tableError}
        </p>
      )}
      <div>
        <Button variant="secondary" onClick={add}>
          Add a heat code
        </Button>
      </div>
      {rows.length > 0 && <HeatScale codes={rowsAsCodes(rows)} label="Heat codes on the heat-step scale" />}
    </div>
  );
}
