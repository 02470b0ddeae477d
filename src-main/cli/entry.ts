/**
 * The `wattledger` command's entry: built into out/cli/wattledger.js (plain JavaScript, by
 * src-main/dev/build-package.ts), which package.json "bin" names. Everything testable lives in main.ts.
 */
import { runFromProcess } from './main.ts';

await runFromProcess();
