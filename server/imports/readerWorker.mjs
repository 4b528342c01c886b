// Entry of the reader thread. A new thread does not inherit the TypeScript loader, so it registers tsx itself, in its
// CommonJS form: that loads in-thread, where the ESM form starts a loader thread of its own (slower to start, measured
// at about 450 ms against 300 ms, and one more heap).
import { createRequire } from 'node:module';
import { register } from 'tsx/cjs/api';

register();
createRequire(import.meta.url)('./readerThreadMain.ts');
