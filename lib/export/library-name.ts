/** A GDSII/OASIS-safe library and top-cell name from a design name: upper case, A–Z 0–9 and _, at most 24 characters. */
export function libraryName(designName: string, revision: number | null): string {
  const base = designName.toUpperCase().replace(/[^A-Z0-9]+/g, '_').replace(/^_+|_+$/g, '').slice(0, 18) || 'DESIGN';
  return revision === null ? base : `${base}_R${revision}`.slice(0, 24);
}
