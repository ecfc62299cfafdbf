import type { ReactNode } from 'react';

/** One editable part of a part: a titled block with its own form and its own save. */
export function Section({ title, aside, children }: { title: string; aside?: ReactNode; children: ReactNode }) {
  return (
    <section aria-label={title} className="rounded-lg border border-ink/10 bg-paper-raised shadow-sm">
      <header className="flex items-center justify-between gap-2 border-b border-ink/10 px-4 py-2">
        <h3 className="text-sm font-semibold text-ink">{title}</h3>
        {aside}
      </header>
      <div className="flex flex-col gap-3 p-4">{children}</div>
    </section>
  );
}
