#!/usr/bin/env node
// `wattledger` command: registers tsx so Node runs the TypeScript sources directly, then hands over to
// main.ts. Kept tiny on purpose; everything testable lives in the .ts modules beside it.
import { register } from 'tsx/esm/api';

register();
const { runFromProcess } = await import('./main.ts');
await runFromProcess();
