import { afterAll } from 'vitest';
import { removeScratchDirs } from '../helpers/scratchDir.ts';

// Registered before each test file's own hooks, so (hooks run as a stack) it runs after them: after the
// file's servers are closed and its stores let go.
afterAll(removeScratchDirs);
