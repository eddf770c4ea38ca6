import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { descriptionOf } from './support/field-error';
import { apiError, mockApi } from './support/fetch-mock';
import { me, project, session } from './support/fixtures';
import { renderApp } from './support/render-app';

const signedOut = session(null);

describe('sign-in form', () => {
  it('shows the schema field errors beside each field and does not call the server', async () => {
    const api = mockApi({ [`GET ${apiRoutes.session}`]: signedOut });
    const { user } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), 'ada.example.test');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail');
    await waitFor(() =>
      expect(descriptionOf(email)).toContain('E-mail must be an e-mail address such as name@example.com'),
    );
    expect(email.getAttribute('aria-invalid')).toBe('true');
    expect(descriptionOf(screen.getByLabelText('Password'))).toContain('Password is required');
    expect(api.callsTo('POST', apiRoutes.signIn)).toHaveLength(0);
  });

  it('keeps what was typed and shows the server message when the password is wrong', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: signedOut,
      [`POST ${apiRoutes.signIn}`]: {
        status: 401,
        body: apiError('unauthenticated', 'That e-mail and password do not match an account.'),
      },
    });
    const { user, location } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), 'ada@example.test');
    await user.type(screen.getByLabelText('Password'), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect((await screen.findByRole('alert')).textContent).toContain(
      'That e-mail and password do not match an account.',
    );
    expect(screen.getByLabelText<HTMLInputElement>('E-mail').value).toBe('ada@example.test');
    expect(screen.getByLabelText<HTMLInputElement>('Password').value).toBe('not-the-password');
    expect(screen.getByRole('button', { name: 'Sign in' }).hasAttribute('disabled')).toBe(false);
    expect(location()).toBe('/sign-in');
  });

  it('sends the schema-normalised values and returns the user to the page they first asked for', async () => {
    let signedIn = false;
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: () => session(signedIn ? me() : null),
      [`POST ${apiRoutes.signIn}`]: () => {
        signedIn = true;
        return { status: 200, body: me() };
      },
      [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project() },
      [`GET ${apiRoutes.projectScenarios(project().id)}`]: { status: 200, body: [] },
    });
    const { user, location } = renderApp(`/projects/${project().id}`);

    await screen.findByRole('heading', { level: 1, name: 'Sign in to Lanewright' });
    expect(location()).toBe(`/sign-in?returnTo=${encodeURIComponent(`/projects/${project().id}`)}`);
    await user.type(screen.getByLabelText('E-mail'), '  Ada@Example.TEST ');
    await user.type(screen.getByLabelText('Password'), 'correct-horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: project().name })).toBeTruthy();
    expect(location()).toBe(`/projects/${project().id}`);
    expect(api.callsTo('POST', apiRoutes.signIn)[0].body).toEqual({
      email: 'ada@example.test',
      password: 'correct-horse',
    });
  });

  it('sends the user to sign-in when any query answers 401, remembering where they were', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me()),
      [`GET ${apiRoutes.project(project().id)}`]: {
        status: 401,
        body: apiError('unauthenticated', 'Your session has ended.'),
      },
      [`GET ${apiRoutes.projectScenarios(project().id)}`]: { status: 200, body: [] },
    });
    const { location } = renderApp(`/projects/${project().id}`);

    await screen.findByRole('heading', { level: 1, name: 'Sign in to Lanewright' });
    expect(location()).toBe(`/sign-in?returnTo=${encodeURIComponent(`/projects/${project().id}`)}`);
  });
});
