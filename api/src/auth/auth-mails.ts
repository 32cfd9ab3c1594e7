import { composeMail } from '../infra/mail/compose-mail';
import type { OutgoingMail } from '../infra/mail/mail.service';

/**
 * The account e-mails. They are transactional: each comes only because something was done with this
 * address (a sign-up, a reset asked for, a change of address), so there is no list to leave and they
 * carry no List-Unsubscribe. Instead each says why it came and links to the account page, where the
 * person sees and changes the mail Fitwright sends them.
 */

/** The closing lines of every account mail: why it came, and where mail is managed. */
export function accountMailFooter(why: string, accountUrl: string): string[] {
  return [`Why you got this: ${why}`, `Your account and the mail Fitwright sends you: ${accountUrl}`];
}

export function verifyEmailMail(to: string, displayName: string, url: string, accountUrl: string): OutgoingMail {
  return composeMail(
    to,
    'Confirm your e-mail address for Fitwright',
    [
      `Hello ${displayName},`,
      'Please confirm that this is your e-mail address. The link works for 48 hours.',
      ...accountMailFooter(
        'this address was used to create a Fitwright account. If that was not you, ignore this message: nothing more is sent to an address that is never confirmed.',
        accountUrl,
      ),
    ],
    { label: 'Confirm my e-mail address', url },
  );
}

export function accountExistsMail(to: string, signInUrl: string, resetUrl: string, accountUrl: string): OutgoingMail {
  return composeMail(to, 'Someone tried to sign up with your e-mail address', [
    'Someone (perhaps you) tried to create a Fitwright account with this address, which already has one.',
    `If it was you, sign in at ${signInUrl}, or choose a new password at ${resetUrl}.`,
    'If it was not you, you can ignore this message; your account is unchanged.',
    ...accountMailFooter('someone entered this address on the sign-up page. It is sent only then.', accountUrl),
  ]);
}

export function resetPasswordMail(to: string, url: string, accountUrl: string): OutgoingMail {
  return composeMail(
    to,
    'Choose a new Fitwright password',
    [
      'Someone asked to reset the password of the Fitwright account with this address.',
      'The link works once, for one hour. If you did not ask, ignore this message.',
      ...accountMailFooter(
        'a password reset was asked for this address on the sign-in page. It is sent only when asked, so there is nothing to unsubscribe from.',
        accountUrl,
      ),
    ],
    { label: 'Choose a new password', url },
  );
}

export function changeEmailMail(to: string, url: string, accountUrl: string): OutgoingMail {
  return composeMail(
    to,
    'Confirm your new e-mail address for Fitwright',
    [
      'Please confirm that Fitwright should use this address for your account. The link works for 24 hours.',
      ...accountMailFooter('a Fitwright account asked to move to this address. If that was not you, ignore this message.', accountUrl),
    ],
    { label: 'Use this e-mail address', url },
  );
}

export function emailTakenMail(to: string, accountUrl: string): OutgoingMail {
  return composeMail(to, 'Your e-mail address is already on Fitwright', [
    'Someone asked to move a Fitwright account to this address, but this address already has an account.',
    'Nothing was changed. If this was you, sign in with this address instead.',
    ...accountMailFooter('another account asked to move to this address. It is sent only then.', accountUrl),
  ]);
}

export function emailChangedMail(to: string, newEmail: string, accountUrl: string): OutgoingMail {
  return composeMail(to, 'Your Fitwright e-mail address was changed', [
    `Your Fitwright account now uses ${newEmail}. Messages will no longer come to this address.`,
    'If you did not make this change, reply to this message or contact the site administrators at once.',
    ...accountMailFooter('this was the address of the account, and the change is told to the old address for your safety.', accountUrl),
  ]);
}

export function passwordChangedMail(to: string, accountUrl: string): OutgoingMail {
  return composeMail(to, 'Your Fitwright password was changed', [
    'The password of your Fitwright account was just changed, and other signed-in browsers were signed out.',
    'If you did not make this change, reset your password now and contact the site administrators.',
    ...accountMailFooter('the password of the account with this address changed. Such notices are always sent, for your safety.', accountUrl),
  ]);
}
