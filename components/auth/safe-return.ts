/** Only same-site paths are followed after signing in; anything else goes to the Desk. */
export function safeReturnPath(value: string | string[] | undefined): string {
  const path = Array.isArray(value) ? value[0] : value;
  return path && path.startsWith('/') && !path.startsWith('//') && !path.startsWith('/\\') ? path : '/desk';
}
