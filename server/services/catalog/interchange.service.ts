import type { DataSource } from 'typeorm';
import { AppError } from '../../errors';
import type { InterchangeClaimRecord } from '../../presenters/interchange.presenter';

export async function getInterchangeClaim(ds: DataSource, id: string): Promise<InterchangeClaimRecord> {
  const rows = (await ds.query(`SELECT id, part_id, foreign_brand, foreign_number, source, confidence FROM interchange WHERE id = $1`, [
    id,
  ])) as InterchangeClaimRecord[];
  if (!rows[0]) throw AppError.notFound('Interchange claim');
  return rows[0];
}
