/** One message to one recipient: both a plain-text and an HTML part, and the page of the app it is about. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
  /** Absolute URL into the app (built on APP_URL). */
  link: string;
}
