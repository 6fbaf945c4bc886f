#!/usr/bin/env node
// Entry point of the `lanewright` command. Loads the TypeScript sources through tsx so the command
// works straight after `npm install`, with no build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./run.ts');
process.exitCode = await main(process.argv.slice(2));
