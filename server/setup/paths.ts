// Where the project lives on disk, wherever it was cloned; every set-up script resolves paths from here.
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
export const clientOutDir = resolve(projectRoot, 'dist', 'client');
