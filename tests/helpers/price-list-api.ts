import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { Response } from 'supertest';
import type { DataSource } from 'typeorm';
import { expect } from 'vitest';
import { supplierPrices } from '../../seed/data/suppliers';
import type { Mapping } from '../../shared/price-list/mapping';
import type { PriceList } from '../../shared/schemas/price-lists';
import type { Supplier } from '../../shared/schemas/suppliers';
import type { Agent } from './test-app';

export interface Signed {
  agent: Agent;
  token: string;
}

export const SAMPLE = {
  clean: 'supplier-a-clean.csv',
  otherLayout: 'supplier-b-other-layout.csv',
  badRows: 'supplier-a-bad-rows.csv',
} as const;

export function sampleFile(name: string): Buffer {
  return readFileSync(new URL(`../../seed/csv/${name}`, import.meta.url));
}

/** A supplier of the test's own, so a commit never moves the demo suppliers' prices other tests read. */
export async function newSupplier({ agent, token }: Signed, label = 'Test supplier'): Promise<Supplier> {
  const tag = randomUUID().slice(0, 8);
  const res = await agent
    .post('/api/suppliers')
    .set('x-csrf-token', token)
    .send({ name: `${label} ${tag}` });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body as { supplier: Supplier }).supplier;
}

export interface UploadOptions {
  supplierId: string;
  file: Buffer | string;
  fileName?: string;
  mapping?: Mapping;
  uploadId?: string;
}

export function upload({ agent, token }: Signed, opts: UploadOptions): Promise<Response> {
  let req = agent.post('/api/price-lists').set('x-csrf-token', token).field('supplierId', opts.supplierId);
  if (opts.mapping) req = req.field('mapping', JSON.stringify(opts.mapping));
  if (opts.uploadId) req = req.field('uploadId', opts.uploadId);
  const bytes = typeof opts.file === 'string' ? Buffer.from(opts.file) : opts.file;
  return req.attach('file', bytes, { filename: opts.fileName ?? 'prices.csv', contentType: 'text/csv' });
}

/** Uploads and expects the list staged. */
export async function stage(signed: Signed, opts: UploadOptions): Promise<PriceList> {
  const res = await upload(signed, opts);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as PriceList;
}

export function post({ agent, token }: Signed, path: string, body: object = {}): Promise<Response> {
  return agent.post(path).set('x-csrf-token', token).send(body);
}

/**
 * A supplier of the test's own holding a demo supplier's prices as seeded (seed/data/suppliers.ts),
 * whatever other tests or journeys have since committed for the demo supplier itself.
 */
export async function supplierWithSeedPrices(ds: DataSource, signed: Signed, seedKey: string): Promise<Supplier> {
  const supplier = await newSupplier(signed, `Copy of ${seedKey}`);
  for (const p of supplierPrices.filter((sp) => sp.supplierKey === seedKey)) {
    await ds.query(
      `INSERT INTO supplier_price (supplier_id, part_id, cost_cents, list_cents, core_cents, pack_qty, effective_date)
       SELECT $1, id, $3, $4, $5, $6, $7 FROM part WHERE part_number = $2`,
      [supplier.id, p.partNumber, p.costCents, p.listCents, p.coreChargeCents, p.packQty, p.effectiveDate],
    );
  }
  return supplier;
}
