// Stubs the network at fetch: each test states which API answers it expects,
// and anything else answers 404 in the API's error shape so a missing route is visible.
import { vi } from 'vitest';

export interface MockAnswer {
  status: number;
  body?: unknown;
}

export interface RecordedCall {
  method: string;
  path: string;
  search: string;
  body: unknown;
}

type Route = MockAnswer | ((call: RecordedCall) => MockAnswer | Promise<MockAnswer>);

export function mockApi(routes: Record<string, Route>) {
  const calls: RecordedCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://lanewright.test');
    const method = init?.method ?? 'GET';
    const call: RecordedCall = {
      method,
      path: url.pathname,
      search: url.search,
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    const route = routes[`${method} ${url.pathname}`];
    const answer: MockAnswer = route
      ? typeof route === 'function'
        ? await route(call)
        : route
      : { status: 404, body: apiError('not_found', `No mocked answer for ${method} ${url.pathname}`) };
    return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
      status: answer.status,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    calls,
    callsTo: (method: string, path: string) => calls.filter((c) => c.method === method && c.path === path),
  };
}

export function apiError(code: string, message: string, fields: { path: string; message: string }[] = []) {
  return { error: { code, message, fields } };
}
