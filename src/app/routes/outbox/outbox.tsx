import { useState } from 'react';
import { ErrorNote, PageHeader, Panel } from '@/components/ui/panel';
import { useOutbox } from '@/features/outbox/api/get-outbox';
import { formatDateTime } from '@shared/format';

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** The plain-text part, with its links made followable (they lead back into Arcwise). */
function MessageText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre className="whitespace-pre-wrap font-sans text-[15px] leading-relaxed text-ink">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="break-all font-medium text-accent underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}

/** The local mail catcher's messages: what Arcwise would have e-mailed. */
export function OutboxPage() {
  const outbox = useOutbox();
  const [open, setOpen] = useState<number | null>(0);
  return (
    <>
      <PageHeader title="Outbox" />
      <p className="mb-4 max-w-3xl text-sm text-ink-soft">
        Messages caught by the local mail catcher. With a real SMTP server configured, mail leaves Arcwise and this page stays empty.
      </p>
      <ErrorNote error={outbox.error} />
      {outbox.data?.length === 0 && <p className="text-ink-soft">No messages yet.</p>}
      <ul className="flex flex-col gap-2">
        {outbox.data?.map((m, i) => (
          <li key={`${m.date}-${i}`}>
            <Panel
              title={
                <button type="button" className="text-left" aria-expanded={open === i} onClick={() => setOpen(open === i ? null : i)}>
                  {m.subject} <span className="font-normal text-ink-soft">— to {m.to}</span>
                </button>
              }
              actions={<time className="text-xs text-ink-faint">{formatDateTime(m.date)}</time>}
            >
              {open === i ? <MessageText text={m.text} /> : <p className="line-clamp-2 text-sm text-ink-soft">{m.text}</p>}
            </Panel>
          </li>
        ))}
      </ul>
    </>
  );
}
