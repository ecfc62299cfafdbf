import type { ReactNode } from 'react';
import type { Change } from '../changes';
import { formatTime } from '@shared/format';

/** What the last save changed, field by field, so the buyer sees the catalog took it. */
export function ChangeNote({
  title,
  changes,
  at,
  children,
}: {
  title: string;
  changes: readonly Change[];
  at: Date;
  children?: ReactNode;
}) {
  // A part or row just added has no "was": two columns read easier than an empty one.
  const allNew = changes.every((c) => c.from === '—');
  return (
    <div role="status" className="rounded-md border border-go/30 bg-go-soft/60 px-3 py-2 text-[15px]">
      <p className="font-semibold text-go">
        {title} <span className="font-normal text-ink-soft">· {formatTime(at)}</span>
      </p>
      {changes.length === 0 ? (
        <p className="text-ink-soft">Nothing differed from what was on file.</p>
      ) : (
        <table className="mt-1 w-full text-left text-sm">
          <thead className="sr-only">
            <tr>
              <th>Field</th>
              {!allNew && <th>Was</th>}
              <th>Now</th>
            </tr>
          </thead>
          <tbody>
            {changes.map((c, i) => (
              <tr key={`${c.what}-${i}`} className="align-baseline">
                <th scope="row" className="w-0 py-0.5 pr-4 font-medium whitespace-nowrap text-ink-soft">
                  {c.what}
                </th>
                {!allNew && <td className="w-0 py-0.5 pr-2 whitespace-nowrap text-ink-soft tabular-nums">{c.from !== '—' && c.from}</td>}
                <td className="py-0.5 font-medium text-ink tabular-nums">
                  {!allNew && c.from !== '—' && (
                    <span aria-hidden className="mr-1.5 text-ink-faint">
                      →
                    </span>
                  )}
                  {c.to}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {children}
    </div>
  );
}
