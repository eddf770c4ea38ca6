// A server study's progress panel against a stubbed API: the count and time left as the server reports
// them, and a plain note, with what to do, when no worker has held one of its jobs for a while.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { StudyDetail, StudyProgress } from '../../../shared/api/studies';
import { ServerStudyProgress } from '../../../src/features/studies/components/server-study-progress';
import { mockApi } from '../support/fetch-mock';
import { uuid } from '../support/fixtures';

const study = {
  id: uuid(31),
  jobCount: 8,
  jobsDone: 0,
  status: 'running',
  runOn: 'server',
} as StudyDetail;

function showWith(progress: StudyProgress) {
  mockApi({ [`GET ${apiRoutes.studyProgress(study.id)}`]: { status: 200, body: progress } });
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <ServerStudyProgress study={study} mayRun />
    </QueryClientProvider>,
  );
}

const running: StudyProgress = {
  status: 'running',
  jobCount: 8,
  jobsDone: 3,
  failedJobs: [],
  remainingMs: 50_000,
  idleSeconds: null,
  finishedAt: null,
};

describe('server study progress', () => {
  it('shows the server’s count and time left, and no idle note while workers hold its jobs', async () => {
    showWith(running);
    await screen.findByText(/3 of 8 jobs done/);
    expect(screen.getByText(/Time left/).textContent).toContain('about 50 s');
    expect(screen.queryByTestId('workers-idle')).toBeNull();
  });

  it('says when no worker has worked on the study, for how long, and how workers are started', async () => {
    showWith({ ...running, jobsDone: 0, remainingMs: null, idleSeconds: 185 });
    const note = await screen.findByTestId('workers-idle');
    expect(note.textContent).toContain('No study worker has worked on this study for 3 min 05 s');
    expect(note.textContent).toContain('npm run worker');
  });
});
