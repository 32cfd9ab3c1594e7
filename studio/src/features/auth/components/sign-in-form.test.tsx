import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** Answers the CSRF bootstrap (GET /api/auth/me) and hands POST /api/auth/login to `login`. */
function serve(login: (init: RequestInit | undefined) => Response) {
  return vi.spyOn(globalThis, 'fetch').mockImplementation(async (input, init) => {
    const url = String(input);
    if (url.endsWith('/api/auth/me')) {
      document.cookie = 'fw_csrf=test-csrf-token-0123456789abcdef';
      return json(200, { user: null });
    }
    if (url.endsWith('/api/auth/login')) return login(init);
    return json(404, { statusCode: 404, message: 'Not found' });
  });
}

function fill(email: string, password: string) {
  fireEvent.change(screen.getByLabelText(/E-mail address/), { target: { value: email } });
  fireEvent.change(screen.getByLabelText(/^Password/), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  beforeEach(() => {
    document.cookie = 'fw_csrf=; expires=Thu, 01 Jan 1970 00:00:00 GMT';
  });
  afterEach(() => vi.restoreAllMocks());

  it('checks the fields before asking the server', async () => {
    const fetchSpy = serve(() => json(200, {}));
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fill('not an address', '');
    expect(await screen.findByText('Enter your e-mail address')).toBeTruthy();
    expect(screen.getByText('Enter your password')).toBeTruthy();
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('puts the API’s field messages under their fields', async () => {
    serve(() =>
      json(400, {
        statusCode: 400,
        message: ['E-mail address is too long'],
        errors: { email: 'E-mail address is too long' },
      }),
    );
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fill('someone@harrow-lane.example', 'a long enough password');
    const message = await screen.findByText('E-mail address is too long');
    const input = screen.getByLabelText(/E-mail address/);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(input.getAttribute('aria-describedby')).toContain(message.id);
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('shows a failed sign-in above the form, and sends the CSRF token it was given', async () => {
    let sentToken: string | null = null;
    serve((init) => {
      sentToken = new Headers(init?.headers).get('X-CSRF-Token');
      return json(401, { statusCode: 401, message: 'The e-mail address or password is incorrect.', code: 'login_failed' });
    });
    renderWithProviders(<SignInForm onSignedIn={() => {}} />);
    fill('someone@harrow-lane.example', 'wrong password here');
    expect((await screen.findByRole('alert')).textContent).toBe('The e-mail address or password is incorrect.');
    expect(sentToken).toBe('test-csrf-token-0123456789abcdef');
  });

  it('hands the signed-in user on', async () => {
    const user = {
      id: 'u1',
      email: 'rowan@harrow-lane.example',
      displayName: 'Rowan Avery',
      isAdmin: false,
      preferredUnits: 'inch',
      emailVerified: true,
    };
    serve(() => json(200, { user }));
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    fill(user.email, 'harrow-lane-demo');
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(user));
  });
});
