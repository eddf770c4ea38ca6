// The API's paths in one place, so the server's routers and the client's
// fetchers cannot drift apart.
export const apiRoutes = {
  signUp: '/api/auth/sign-up',
  signIn: '/api/auth/sign-in',
  signOut: '/api/auth/sign-out',
  me: '/api/me',
  projects: '/api/projects',
  project: (id: string) => `/api/projects/${id}`,
  projectScenarios: (projectId: string) => `/api/projects/${projectId}/scenarios`,
  projectRuns: (projectId: string) => `/api/projects/${projectId}/runs`,
  scenario: (id: string) => `/api/scenarios/${id}`,
  scenarioRevisions: (id: string) => `/api/scenarios/${id}/revisions`,
  scenarioRevision: (id: string, n: number) => `/api/scenarios/${id}/revisions/${n}`,
  scenarioRuns: (id: string) => `/api/scenarios/${id}/runs`,
  run: (id: string) => `/api/runs/${id}`,
  scenarioTimeStudies: (id: string) => `/api/scenarios/${id}/time-studies`,
  timeStudy: (id: string) => `/api/time-studies/${id}`,
  members: (organisationId: string) => `/api/organisations/${organisationId}/members`,
  member: (organisationId: string, userId: string) => `/api/organisations/${organisationId}/members/${userId}`,
  audit: (organisationId: string) => `/api/organisations/${organisationId}/audit`,
  priceList: (organisationId: string) => `/api/organisations/${organisationId}/price-list`,
} as const;
