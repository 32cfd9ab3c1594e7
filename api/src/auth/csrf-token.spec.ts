import { csrfTokenFits, makeCsrfToken } from './csrf-token';

const KEY = 'a test key that is at least thirty-two characters';
const SESSION = 'session-token-one-0123456789abcdef';

describe('signed CSRF tokens', () => {
  it('fit the session they were made for, and only it', () => {
    const token = makeCsrfToken(KEY, SESSION);
    expect(csrfTokenFits(KEY, SESSION, token)).toBe(true);
    expect(csrfTokenFits(KEY, 'session-token-two-0123456789abcdef', token)).toBe(false);
    expect(csrfTokenFits(KEY, undefined, token)).toBe(false);
  });

  it('made before sign-in fit no session', () => {
    const anonymous = makeCsrfToken(KEY, undefined);
    expect(csrfTokenFits(KEY, undefined, anonymous)).toBe(true);
    expect(csrfTokenFits(KEY, SESSION, anonymous)).toBe(false);
  });

  it('need the server key: the same token under another key, or a changed nonce, is refused', () => {
    const token = makeCsrfToken(KEY, SESSION);
    expect(csrfTokenFits('another key, also thirty-two characters long', SESSION, token)).toBe(false);
    const [nonce, mac] = token.split('.');
    expect(csrfTokenFits(KEY, SESSION, `${nonce.replace(/^./, (c) => (c === 'A' ? 'B' : 'A'))}.${mac}`)).toBe(false);
    expect(csrfTokenFits(KEY, SESSION, 'no-dot-at-all')).toBe(false);
    expect(csrfTokenFits(KEY, SESSION, `.${mac}`)).toBe(false);
  });

  it('are fresh each time', () => {
    expect(makeCsrfToken(KEY, SESSION)).not.toBe(makeCsrfToken(KEY, SESSION));
  });
});
