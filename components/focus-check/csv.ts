/** Plain CSV (RFC 4180 quoting) of a header and rows of numbers or text. */
export function toCsv(header: string[], rows: Array<Array<number | string | null>>): string {
  const cell = (v: number | string | null) => {
    if (v === null) return '';
    const text = typeof v === 'number' ? (Number.isFinite(v) ? String(v) : '') : v;
    return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
  };
  return [header, ...rows].map((row) => row.map(cell).join(',')).join('\r\n') + '\r\n';
}

/** Offers text as a file download in the browser. */
export function downloadText(filename: string, text: string, type = 'text/csv'): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.click();
  URL.revokeObjectURL(url);
}
