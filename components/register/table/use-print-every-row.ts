'use client';

import type { Table } from '@tanstack/react-table';
import { useEffect } from 'react';
import { flushSync } from 'react-dom';

/**
 * A printed register holds every row that passes the filters, not the page on screen: the page size grows to all
 * of them as printing starts and comes back after. Browsers announce printing by `beforeprint` (the print dialog)
 * or by the print media query matching (a headless PDF); either one is enough.
 */
export function usePrintEveryRow<T>(table: Table<T>): void {
  useEffect(() => {
    const media = window.matchMedia('print');
    let saved: { pageIndex: number; pageSize: number } | null = null;
    const start = () => {
      if (saved) return;
      saved = table.getState().pagination;
      // The print snapshot is taken right after the event: the rows must be in the page before it returns.
      flushSync(() => table.setPagination({ pageIndex: 0, pageSize: Math.max(1, table.getPrePaginationRowModel().rows.length) }));
    };
    const end = () => {
      if (!saved) return;
      const restore = saved;
      saved = null;
      table.setPagination(restore);
    };
    const change = (e: MediaQueryListEvent) => (e.matches ? start() : end());
    window.addEventListener('beforeprint', start);
    window.addEventListener('afterprint', end);
    media.addEventListener('change', change);
    return () => {
      window.removeEventListener('beforeprint', start);
      window.removeEventListener('afterprint', end);
      media.removeEventListener('change', change);
    };
  }, [table]);
}
