// Request size limits. A stored run carries its full result (heatmaps, per-station tables), which sets the
// JSON body limit; see docs/server.md for the measured size of a realistic result.
export const JSON_BODY_LIMIT_BYTES = 8 * 1024 * 1024;
