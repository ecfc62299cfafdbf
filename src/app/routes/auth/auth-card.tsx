import type { ReactNode } from 'react';

export function AuthCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex min-h-screen items-center justify-center bg-paper-sunk px-4">
      <div className="w-full max-w-sm rounded-xl border border-ink/10 bg-paper-raised p-7 shadow-sm">
        <p className="mb-1 text-sm font-semibold uppercase tracking-widest text-accent">Arcwise</p>
        <h1 className="mb-5 text-xl font-semibold text-ink">{title}</h1>
        {children}
      </div>
    </div>
  );
}
