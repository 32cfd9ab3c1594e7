import { composeMail } from '../infra/mail/compose-mail';
import type { OutgoingMail } from '../infra/mail/mail.service';

/** The account e-mails. */

export function verifyEmailMail(to: string, displayName: string, url: string): OutgoingMail {
  return composeMail(
    to,
    'Confirm your e-mail address for Fitwright',
    [`Hello ${displayName},`, 'Please confirm that this is your e-mail address. The link works for 48 hours.'],
    { label: 'Confirm my e-mail address', url },
  );
}

export function accountExistsMail(to: string, signInUrl: string, resetUrl: string): OutgoingMail {
  return composeMail(to, 'Someone tried to sign up with your e-mail address', [
    'Someone (perhaps you) tried to create a Fitwright account with this address, which already has one.',
    `If it was you, sign in at ${signInUrl}, or choose a new password at ${resetUrl}.`,
    'If it was not you, you can ignore this message; your account is unchanged.',
  ]);
}

export function resetPasswordMail(to: string, url: string): OutgoingMail {
  return composeMail(
    to,
    'Choose a new Fitwright password',
    [
      'Someone asked to reset the password of the Fitwright account with this address.',
      'The link works once, for one hour. If you did not ask, ignore this message.',
    ],
    { label: 'Choose a new password', url },
  );
}

export function changeEmailMail(to: string, url: string): OutgoingMail {
  return composeMail(
    to,
    'Confirm your new e-mail address for Fitwright',
    ['Please confirm that Fitwright should use this address for your account. The link works for 24 hours.'],
    { label: 'Use this e-mail address', url },
  );
}

export function emailTakenMail(to: string): OutgoingMail {
  return composeMail(to, 'Your e-mail address is already on Fitwright', [
    'Someone asked to move a Fitwright account to this address, but this address already has an account.',
    'Nothing was changed. If this was you, sign in with this address instead.',
  ]);
}

export function emailChangedMail(to: string, newEmail: string): OutgoingMail {
  return composeMail(to, 'Your Fitwright e-mail address was changed', [
    `Your Fitwright account now uses ${newEmail}. Messages will no longer come to this address.`,
    'If you did not make this change, reply to this message or contact the site administrators at once.',
  ]);
}

export function passwordChangedMail(to: string): OutgoingMail {
  return composeMail(to, 'Your Fitwright password was changed', [
    'The password of your Fitwright account was just changed, and other signed-in browsers were signed out.',
    'If you did not make this change, reset your password now and contact the site administrators.',
  ]);
}
