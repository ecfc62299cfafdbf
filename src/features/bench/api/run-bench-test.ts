import { useMutation } from '@tanstack/react-query';
import { benchResultSchema, type BenchBody, type BenchResult } from '@shared/schemas/bench';
import { api } from '@/lib/api-client';

export const runBenchTest = (body: BenchBody): Promise<BenchResult> => api('POST', '/api/bench/coil', { body, schema: benchResultSchema });

/** Corrects the readings to 20 °C and holds them against the coil's windows (on the server, with the admin's settings). */
export const useRunBenchTest = () => useMutation({ mutationFn: runBenchTest });
