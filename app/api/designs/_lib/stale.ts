import type { DesignVersionInfo } from '@/db/queries/designs';

/** The message for an edit made from a page older than the design. */
export function staleMessage(current: DesignVersionInfo, what: string): string {
  const who = current.updatedByName ? ` by ${current.updatedByName}` : '';
  const when = current.updatedAt.toISOString().slice(0, 16).replace('T', ' ');
  return `This design was changed${who} at ${when} UTC, after this page loaded, so your ${what} was not saved and nothing was overwritten. Copy your text, reload the page and apply it again.`;
}
