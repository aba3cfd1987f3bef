'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { DropCase, DropResult } from '@/lib/physics';
import type { FieldIssue } from '@/lib/validation/issues';

class DropRequestError extends Error {
  constructor(
    message: string,
    public readonly issues: FieldIssue[] = [],
  ) {
    super(message);
  }
}

function useDebounced<T>(value: T, ms: number): T {
  const [debounced, setDebounced] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setDebounced(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return debounced;
}

export interface ComputedDrop {
  result: DropResult;
  /** The case the result belongs to: while a new one computes, the last result stays on screen with its own case. */
  dropCase: DropCase;
}

async function postDrop(body: string): Promise<ComputedDrop> {
  const response = await fetch('/api/v1/drops', { method: 'POST', headers: { 'content-type': 'application/json' }, body });
  const json = await response.json().catch(() => ({}));
  if (response.status === 401) throw new DropRequestError('Your session has ended: sign in again.');
  if (!response.ok) throw new DropRequestError(json.error ?? 'The case could not be computed.', json.errors ?? []);
  return { result: json as DropResult, dropCase: JSON.parse(body) as DropCase };
}

/** The drop case as JSON, sent 300 ms after the last keystroke; identical cases come from the cache. */
export function useDropResult(caseJson: string | null) {
  const body = useDebounced(caseJson, 300);
  const query = useQuery({
    queryKey: ['drop', body],
    queryFn: () => postDrop(body!),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
  const settling = caseJson !== body || query.isFetching;
  return { ...query, settling };
}
