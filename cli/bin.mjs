#!/usr/bin/env node
// Installed entry point: registers tsx so the TypeScript CLI runs as is, then starts it.
import { register } from 'tsx/esm/api';

register();
await import('./main.ts');
