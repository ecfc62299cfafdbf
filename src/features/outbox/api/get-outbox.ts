import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { outboxMessageSchema } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) });

export const outboxKeys = { all: ['outbox'] as const };

export const getOutbox = async () => (await api('GET', '/api/outbox', { schema: outboxResponseSchema })).messages;

export const useOutbox = () => useQuery({ queryKey: outboxKeys.all, queryFn: getOutbox, refetchInterval: 5000 });
