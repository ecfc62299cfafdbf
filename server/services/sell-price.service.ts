import type { DataSource } from 'typeorm';
import type { SetSellPriceRuleBody } from '../../shared/schemas/sell-price';
import { AppError } from '../errors';
import { audit } from '../repositories/audit.repository';
import {
  clearPreferredSupplier,
  findSellPriceRule,
  listSellPriceRules,
  setPreferredSupplier,
  type SellPriceRuleRow,
} from '../repositories/sell-price-rules.repository';
import { findSupplier } from '../repositories/suppliers.repository';

/**
 * The buyer's sell-price rule, per brand: a preferred supplier, or the lowest list price (no row).
 * The rule itself is applied where prices are read (prices.repository.ts), so the Counter, the
 * part panel and a commit's message all follow the same one.
 */
export function listRules(ds: DataSource): Promise<SellPriceRuleRow[]> {
  return listSellPriceRules(ds.manager);
}

export function setRule(ds: DataSource, actorId: string, brandId: string, body: SetSellPriceRuleBody): Promise<SellPriceRuleRow> {
  return ds.transaction(async (m) => {
    if (!(await findSellPriceRule(m, brandId))) throw AppError.notFound('Brand');
    if (body.supplierId === null) {
      await clearPreferredSupplier(m, brandId);
    } else {
      const supplier = await findSupplier(m, body.supplierId);
      if (!supplier) throw AppError.notFound('Supplier');
      if (supplier.archived_at) throw AppError.conflict('This supplier is archived: restore it before preferring it.');
      await setPreferredSupplier(m, brandId, body.supplierId, actorId);
    }
    await audit(m, {
      actorId,
      action: 'sell-price-rule.set',
      entityType: 'brand',
      entityId: brandId,
      data: { supplierId: body.supplierId },
    });
    const rule = await findSellPriceRule(m, brandId);
    if (!rule) throw AppError.notFound('Brand');
    return rule;
  });
}
