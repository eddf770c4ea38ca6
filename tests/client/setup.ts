// Client test set-up: a clean DOM, network stubs and storage after each test,
// and any console.error (React warnings included) fails the test that caused it.
import { cleanup, configure } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';

// Some pages load on demand; on a busy machine the first import can take longer than the default second.
configure({ asyncUtilTimeout: 5000 });

beforeEach(() => {
  vi.spyOn(console, 'error').mockImplementation((...args: unknown[]) => {
    throw new Error(`console.error was called: ${args.map(String).join(' ')}`);
  });
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  window.localStorage.clear();
});
