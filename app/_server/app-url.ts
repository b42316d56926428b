/** The app's public address without a trailing slash, for links in e-mails. */
export function appUrl(): string {
  const configured = process.env.APP_URL || process.env.NEXTAUTH_URL || `http://127.0.0.1:${process.env.PORT || 3000}`;
  return configured.replace(/\/+$/, '');
}
