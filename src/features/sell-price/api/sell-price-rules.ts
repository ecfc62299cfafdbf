import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { sellPriceRuleResponseSchema, sellPriceRulesResponseSchema, type SetSellPriceRuleBody } from '@shared/schemas/sell-price';
import { api } from '@/lib/api-client';

export const sellPriceKeys = { rules: ['sell-price-rules'] as const };

export const getSellPriceRules = async () => (await api('GET', '/api/sell-price-rules', { schema: sellPriceRulesResponseSchema })).rules;

export const sellPriceRulesQueryOptions = () => queryOptions({ queryKey: sellPriceKeys.rules, queryFn: getSellPriceRules });

export const useSellPriceRules = () => useQuery(sellPriceRulesQueryOptions());

export const setSellPriceRule = async ({ brandId, ...body }: SetSellPriceRuleBody & { brandId: string }) =>
  (await api('PUT', `/api/sell-price-rules/${encodeURIComponent(brandId)}`, { body, schema: sellPriceRuleResponseSchema })).rule;

/** A new rule moves sell prices everywhere: the parts and engines read since are read again. */
export function useSetSellPriceRule() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: setSellPriceRule, onSuccess: () => qc.invalidateQueries() });
}
