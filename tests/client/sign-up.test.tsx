import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { descriptionOf } from './support/field-error';
import { apiError, mockApi } from './support/fetch-mock';
import { session } from './support/fixtures';
import { renderApp } from './support/render-app';

describe('sign-up form', () => {
  it('puts a server field error beside the field it names and keeps every typed value', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(null),
      [`POST ${apiRoutes.signUp}`]: {
        status: 400,
        body: apiError('bad_request', 'Invalid input in the request body: email is not accepted here', [
          { path: 'email', message: 'is not accepted here' },
        ]),
      },
    });
    const { user } = renderApp('/sign-up');

    await user.type(await screen.findByLabelText('Your name'), 'Ada Fieldhouse');
    await user.type(screen.getByLabelText('Organisation'), 'Northgate Fixtures');
    await user.type(screen.getByLabelText('E-mail'), 'ada@example.test');
    await user.type(screen.getByLabelText('Password'), 'long-enough-secret');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    const email = screen.getByLabelText('E-mail');
    await waitFor(() => expect(descriptionOf(email)).toContain('E-mail is not accepted here'));
    expect(descriptionOf(screen.getByLabelText('Password'))).not.toContain('accepted');
    expect(descriptionOf(screen.getByLabelText('Your name'))).not.toContain('accepted');
    expect(screen.getByLabelText<HTMLInputElement>('Your name').value).toBe('Ada Fieldhouse');
    expect(screen.getByLabelText<HTMLInputElement>('Organisation').value).toBe('Northgate Fixtures');
    expect(screen.getByLabelText<HTMLInputElement>('E-mail').value).toBe('ada@example.test');
    expect(screen.getByLabelText<HTMLInputElement>('Password').value).toBe('long-enough-secret');
  });

  it('says a link is on its way, whatever the address, and signs nobody in', async () => {
    const message = 'Check your mailbox: we sent a link to finish creating your account.';
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(null),
      [`POST ${apiRoutes.signUp}`]: { status: 202, body: { message } },
    });
    const { user } = renderApp('/sign-up');
    await user.type(await screen.findByLabelText('Your name'), 'Ada Fieldhouse');
    await user.type(screen.getByLabelText('Organisation'), 'Northgate Fixtures');
    await user.type(screen.getByLabelText('E-mail'), 'ada@example.test');
    await user.type(screen.getByLabelText('Password'), 'long-enough-secret');
    await user.click(screen.getByRole('button', { name: 'Create account' }));
    expect((await screen.findByRole('status')).textContent).toContain(message);
    expect(api.callsTo('GET', apiRoutes.session)).toHaveLength(1);
  });

  it('quotes the shared password rule before anything is sent', async () => {
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(null),
    });
    const { user } = renderApp('/sign-up');

    await user.type(await screen.findByLabelText('Password'), 'short');
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    await waitFor(() =>
      expect(descriptionOf(screen.getByLabelText('Password'))).toContain('Password must be at least 10 characters'),
    );
    expect(descriptionOf(screen.getByLabelText('Your name'))).toContain('Your name is required');
    expect(api.callsTo('POST', apiRoutes.signUp)).toHaveLength(0);
  });
});
