import { useQuery } from '@tanstack/react-query';
import { outboxResponseSchema } from '@shared/schemas/outbox';
import { api } from '@/lib/api-client';

export const outboxKeys = { all: ['outbox'] as const };

export const getOutbox = async () => (await api('GET', '/api/outbox', { schema: outboxResponseSchema })).messages;

export const useOutbox = () => useQuery({ queryKey: outboxKeys.all, queryFn: getOutbox, refetchInterval: 5000 });
