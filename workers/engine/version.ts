// Stored with every run so a result can be traced to the engine that made it. Bump on any change
// that can alter a result for the same scenario, settings and seed.
export const ENGINE_VERSION = '1.2.0';
