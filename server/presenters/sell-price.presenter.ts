import type { SellPriceRule, SellPriceRuleResponse, SellPriceRulesResponse } from '../../shared/schemas/sell-price';
import type { SellPriceRuleRow } from '../repositories/sell-price-rules.repository';

function presentRule(r: SellPriceRuleRow): SellPriceRule {
  return {
    brandId: r.brand_id,
    brand: r.brand,
    supplierId: r.supplier_id,
    supplier: r.supplier,
    updatedAt: r.updated_at?.toISOString() ?? null,
  };
}

export const presentSellPriceRules = (rows: SellPriceRuleRow[]): SellPriceRulesResponse => ({ rules: rows.map(presentRule) });
export const presentSellPriceRule = (row: SellPriceRuleRow): SellPriceRuleResponse => ({ rule: presentRule(row) });
