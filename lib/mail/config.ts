/** Where mail goes, from the environment. Defaults to the local SMTP fake on 127.0.0.1:2525. */
export interface MailConfig {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  password?: string;
  from: string;
}

export function mailConfig(env: NodeJS.ProcessEnv = process.env): MailConfig {
  return {
    host: env.SMTP_HOST || '127.0.0.1',
    port: Number(env.SMTP_PORT || 2525),
    secure: env.SMTP_SECURE === 'true',
    user: env.SMTP_USER || undefined,
    password: env.SMTP_PASSWORD || undefined,
    from: env.MAIL_FROM || 'Zonewright <no-reply@zonewright.local>',
  };
}

/**
 * A local run sends to the SMTP fake on this machine, whose captured mail the Mailbox page shows.
 * ZW_MAILBOX=on|off overrides the guess from SMTP_HOST.
 */
export function isLocalRun(env: NodeJS.ProcessEnv = process.env): boolean {
  if (env.ZW_MAILBOX === 'on') return true;
  if (env.ZW_MAILBOX === 'off') return false;
  return ['127.0.0.1', 'localhost', '::1'].includes(mailConfig(env).host);
}
