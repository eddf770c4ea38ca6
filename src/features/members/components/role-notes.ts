// One sentence on what each role may do, beside every place a role is chosen.
export const ROLE_NOTES =
  'Viewers read projects and results; engineers also edit scenarios, run and share; owners also manage members and read the audit trail.';
