import type { OutgoingMail } from './mailer';

/** Plain-text bodies: links stand alone on their line so every mail client makes them clickable. */
export function invitationMail(to: string, name: string, link: string, invitedBy: string): OutgoingMail {
  return {
    to,
    subject: 'You have been invited to Sojourn',
    text: [
      `Hello ${name},`,
      '',
      `${invitedBy} has invited you to Sojourn, where our capacity studies are written, reviewed and delivered.`,
      'Choose your password with this link (valid for 7 days):',
      '',
      link,
      '',
      'If you did not expect this message, you can ignore it.',
    ].join('\n'),
  };
}

export function passwordResetMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Sojourn password',
    text: [
      'Someone asked to reset the password of this Sojourn account.',
      'Choose a new password with this link (valid for one hour, usable once):',
      '',
      link,
      '',
      'If it was not you, ignore this message: your password stays as it is.',
    ].join('\n'),
  };
}
