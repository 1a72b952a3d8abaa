import { useQuery } from '@tanstack/react-query';
import { fetchJson } from './fetchJson.ts';

export type Health = { status: 'ok' | 'degraded'; database: { state: 'up' | 'down'; latencyMs?: number } };

/** The API's health, polled gently for the status mark in the footer. */
export function useHealth() {
  return useQuery({
    queryKey: ['health'],
    queryFn: () => fetchJson<Health>('/api/health'),
    refetchInterval: 30_000,
    retry: false,
  });
}
