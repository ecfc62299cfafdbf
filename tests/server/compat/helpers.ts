import type { DataSource } from 'typeorm';
import { normalizePartNumber } from '../../../shared/part-number';

/** Ids of demo parts and engines, looked up by their printed number or code (seeded by the global set-up). */
export async function partIdOf(ds: DataSource, printed: string): Promise<string> {
  const rows = (await ds.query(`SELECT id FROM part WHERE part_number_norm = $1`, [normalizePartNumber(printed)])) as { id: string }[];
  if (!rows[0]) throw new Error(`no demo part ${printed}`);
  return rows[0].id;
}

export async function engineIdOf(ds: DataSource, code: string): Promise<string> {
  const rows = (await ds.query(`SELECT id FROM engine WHERE code = $1`, [code])) as { id: string }[];
  if (!rows[0]) throw new Error(`no demo engine ${code}`);
  return rows[0].id;
}
