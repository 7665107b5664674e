// Launcher of a simulation worker thread: register tsx's loader (Node 20 cannot
// run TypeScript, and a worker does not inherit the main thread's hooks), then start it.
import { register } from 'tsx/esm/api';

register();
await import('./simulate-worker.ts');
