#!/usr/bin/env node
// Installed entry point: registers tsx so the TypeScript command line runs without a build step.
import { register } from 'tsx/esm/api';

register();
await import('../server/cli/index.ts');
