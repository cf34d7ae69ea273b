import type { MailNotice } from '../mail/compose-mail.js';

/** The link that finishes a self-registration: the address proves itself, the password proves the person. */
export function confirmEmailNotice(to: string, displayName: string, token: string): MailNotice {
  return {
    to,
    subject: 'Confirm your Channelwright account',
    heading: 'Confirm your address',
    paragraphs: [
      `Someone, probably you, signed up for Channelwright as ${displayName} with this address.`,
      'Open the link and sign in with the password you chose to finish; the link works for 24 hours. If it was not you, ignore this mail: no account is opened without the link and that password.',
    ],
    path: `/sign-in?confirm=${encodeURIComponent(token)}`,
    linkLabel: 'Confirm and sign in',
  };
}

/** A sign-up with an address that has an account already: its owner hears of it, the form answers as always. */
export function alreadyRegisteredNotice(to: string): MailNotice {
  return {
    to,
    subject: 'Someone tried to sign up with your address',
    heading: 'You already have an account',
    paragraphs: [
      'Someone tried to open a new Channelwright account with this address, which has one already. Nothing was changed.',
      'If it was you, sign in with your password instead. If it was not, you need do nothing.',
    ],
    path: '/sign-in',
    linkLabel: 'Sign in',
  };
}
