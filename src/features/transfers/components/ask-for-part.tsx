import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { z } from 'zod';
import { formatCount } from '@shared/format';
import { transferRequestBodySchema, type StockElsewhere, type Transfer } from '@shared/schemas/locations';
import type { PartSummary } from '@shared/schemas/parts';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useRequestTransfer } from '../api/request-transfer';

type Part = Pick<PartSummary, 'id' | 'brand' | 'partNumber'>;

export interface AskForPartProps {
  part: Part;
  /** The other stores that hold the part (the part detail lists only those with some on hand). */
  elsewhere: readonly StockElsewhere[];
}

/**
 * From the part panel: one "Ask <store>" per other store that holds the part, each opening a
 * small form for how many (1 up to what that store has on hand). The request goes to that store's
 * Transfers page; the parts come to the clerk's own store.
 */
export function AskForPart({ part, elsewhere }: AskForPartProps) {
  const [asking, setAsking] = useState<StockElsewhere | null>(null);
  const stores = elsewhere.filter((s) => s.onHand > 0);
  if (stores.length === 0) return null;
  return (
    <div className="flex flex-wrap gap-2">
      {stores.map((s) => (
        <Button key={s.locationId} variant="secondary" onClick={() => setAsking(s)}>
          Ask {s.name}…
        </Button>
      ))}
      <Dialog
        title={asking ? `Ask ${asking.name} for ${part.partNumber}` : 'Ask another store'}
        description={asking ? `${asking.name} has ${formatCount(asking.onHand)} on hand. They come to your store.` : undefined}
        open={asking !== null}
        onOpenChange={(open) => !open && setAsking(null)}
      >
        {asking && <AskForm key={asking.locationId} part={part} store={asking} onClose={() => setAsking(null)} />}
      </Dialog>
    </div>
  );
}

function AskForm({ part, store, onClose }: { part: Part; store: StockElsewhere; onClose: () => void }) {
  // The request's own quantity rule, held to what this store has on hand.
  const schema = useMemo(() => z.object({ quantity: transferRequestBodySchema.shape.quantity.max(store.onHand) }), [store.onHand]);
  const form = useSchemaForm(schema, { defaultValues: { quantity: 1 } });
  const request = useRequestTransfer();
  const quantity = form.watch('quantity');
  const valid = schema.safeParse({ quantity }).success;

  if (request.data) return <Asked transfer={request.data} onClose={onClose} />;
  return (
    <Form
      form={form}
      serverError={request.error}
      onSubmit={({ quantity }) => request.mutate({ partId: part.id, fromLocationId: store.locationId, quantity })}
      aria-label={`Ask ${store.name} for ${part.partNumber}`}
      className="flex flex-col gap-3"
    >
      <Field
        name="quantity"
        label="Quantity"
        number
        inputMode="numeric"
        autoComplete="off"
        className="max-w-32"
        hint={`From 1 to ${formatCount(store.onHand)}.`}
      />
      <div className="mt-2 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onClose} disabled={request.isPending}>
          Cancel
        </Button>
        <Button type="submit" disabled={request.isPending} aria-busy={request.isPending || undefined}>
          {valid ? `Ask for ${formatCount(Number(quantity))} from ${store.name}` : `Ask ${store.name}`}
        </Button>
      </div>
    </Form>
  );
}

function Asked({ transfer, onClose }: { transfer: Transfer; onClose: () => void }) {
  return (
    <div className="flex flex-col gap-3">
      <p role="status" className="rounded-md border border-go/30 bg-go-soft px-3 py-2 text-go">
        Asked {transfer.from.name} for {formatCount(transfer.quantity)} × {transfer.brand} {transfer.partNumber}. You get a mail at each
        step.
      </p>
      <div className="flex flex-wrap items-center justify-end gap-3">
        <Link to="/transfers" className="font-medium text-accent-strong underline underline-offset-2">
          Follow it on Transfers
        </Link>
        <Button variant="secondary" onClick={onClose}>
          Close
        </Button>
      </div>
    </div>
  );
}
