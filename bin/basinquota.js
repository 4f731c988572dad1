#!/usr/bin/env node
// Entry point: register the tsx loader, then run the TypeScript command line.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../lib/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
