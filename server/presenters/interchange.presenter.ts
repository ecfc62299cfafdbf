import type { InterchangeResponse } from '../../shared/schemas/interchange';

export interface InterchangeClaimRecord {
  id: string;
  part_id: string;
  foreign_brand: string;
  foreign_number: string;
  source: string;
  confidence: number;
}

/** POST /api/interchange: the claim as stored. */
export function presentInterchangeClaim(r: InterchangeClaimRecord): InterchangeResponse {
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
