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

/** For a person who already has an account: the administrator sent a fresh way in. */
export function accessLinkMail(to: string, name: string, link: string, sentBy: string): OutgoingMail {
  return {
    to,
    subject: 'A new access link for Sojourn',
    text: [
      `Hello ${name},`,
      '',
      `${sentBy} sent you a new link to set your Sojourn password (valid for 7 days, usable once):`,
      '',
      link,
      '',
      'Your current password keeps working until you use the link.',
    ].join('\n'),
  };
}
