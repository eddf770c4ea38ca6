import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { projectSchema } from '../../shared/api/projects';
import { api, ApiRequestError } from '../../src/lib/api-client';
import { apiError, mockApi } from './support/fetch-mock';
import { project } from './support/fixtures';

async function failureOf(promise: Promise<unknown>): Promise<ApiRequestError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  if (!(error instanceof ApiRequestError)) throw new Error(`expected an ApiRequestError, got ${String(error)}`);
  return error;
}

describe('api client', () => {
  it('returns the answer parsed by the schema and sends JSON with same-origin credentials', async () => {
    const calls = mockApi({ 'POST /api/projects': { status: 201, body: project() } });
    const result = await api.post('/api/projects', { name: 'x' }, projectSchema);
    expect(result).toEqual(project());
    expect(calls.calls[0].body).toEqual({ name: 'x' });
  });

  it('turns the error shape into an ApiRequestError with status, code, message and fields', async () => {
    mockApi({
      'POST /api/projects': {
        status: 400,
        body: apiError('bad_request', 'Check the marked fields.', [{ path: 'name', message: 'is required' }]),
      },
    });
    const error = await failureOf(api.post('/api/projects', {}, projectSchema));
    expect(error).toMatchObject({
      status: 400,
      code: 'bad_request',
      message: 'Check the marked fields.',
      fields: [{ path: 'name', message: 'is required' }],
    });
  });

  it('names the first wrong path when an answer does not match the schema', async () => {
    mockApi({ 'GET /api/projects': { status: 200, body: [{ ...project(), scenarioCount: -1 }] } });
    const error = await failureOf(api.get('/api/projects', z.array(projectSchema)));
    expect(error.code).toBe('invalid_response');
    expect(error.message).toContain('[0].scenarioCount');
  });

  it('explains an answer that is not the API error shape', async () => {
    mockApi({ 'GET /api/me': { status: 502, body: '<html>Bad gateway</html>' } });
    const error = await failureOf(api.get('/api/me', z.unknown()));
    expect(error).toMatchObject({ status: 502, code: 'unexpected_status' });
    expect(error.message).toContain('502');
  });
});
