import type { RevisionRow } from './types';

export type HistoryColumn = 'number' | 'author' | 'message' | 'state' | 'zones' | 'narrowest' | 'size' | 'date';

export interface HistoryView {
  sortBy: HistoryColumn;
  descending: boolean;
  /** free text matched against message and author */
  text: string;
  /** a review state, or '' for all */
  state: string;
}

const KEYS: Record<HistoryColumn, (r: RevisionRow) => number | string | null> = {
  number: (r) => r.number,
  author: (r) => (r.authorName ?? '').toLowerCase(),
  message: (r) => r.message.toLowerCase(),
  state: (r) => r.state,
  zones: (r) => r.zoneCount,
  narrowest: (r) => r.narrowestFeature,
  size: (r) => r.bundleBytes,
  date: (r) => r.createdAt,
};

/** Filters and sorts the history; rows without a value (still exporting, failed) sort last either way. */
export function viewHistory(rows: RevisionRow[], view: HistoryView): RevisionRow[] {
  const needle = view.text.trim().toLowerCase();
  const key = KEYS[view.sortBy];
  return rows
    .filter((r) => (view.state ? r.state === view.state : true))
    .filter((r) => !needle || r.message.toLowerCase().includes(needle) || (r.authorName ?? '').toLowerCase().includes(needle))
    .sort((a, b) => {
      const ka = key(a);
      const kb = key(b);
      if (ka === null || kb === null) return ka === kb ? b.number - a.number : ka === null ? 1 : -1;
      const order = ka < kb ? -1 : ka > kb ? 1 : 0;
      return (view.descending ? -order : order) || b.number - a.number;
    });
}

export function formatBytes(bytes: number | null): string {
  if (bytes === null) return '—';
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(2)} MB`;
}
