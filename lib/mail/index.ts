export { sendMail, type OutgoingMail, type SendResult } from './send';
export { mailConfig, isLocalRun, type MailConfig } from './config';
export { signInLinkEmail, invitationEmail } from './account-emails';
