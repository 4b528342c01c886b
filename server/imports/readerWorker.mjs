// Entry of the reader thread: a new thread does not inherit the TypeScript loader, so it registers tsx itself
// (as cli/bin.mjs does) before loading the reader.
import { register } from 'tsx/esm/api';

register();
await import('./readerThreadMain.ts');
