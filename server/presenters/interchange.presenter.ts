import type { InterchangeResponse } from '../../shared/schemas/interchange';
import type { InterchangeClaimRow } from '../repositories/interchange.repository';

/** POST /api/interchange: the claim as stored. */
export function presentInterchangeClaim(r: InterchangeClaimRow): InterchangeResponse {
  return {
    interchange: {
      id: r.id,
      partId: r.part_id,
      brand: r.foreign_brand,
      number: r.foreign_number,
      source: r.source,
      confidence: r.confidence,
    },
  };
}
