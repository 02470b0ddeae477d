/**
 * `npm start`: builds WattLedger and runs it — in Electron when its runtime is installed (on the
 * built-in demo design, which the renderer loads by default), otherwise in a browser: the renderer is
 * built and served with Vite's preview server on 127.0.0.1 until Ctrl+C. The decision is in
 * start-plan.ts.
 */
import { spawn } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import nodePath from 'node:path';
import { preview } from 'vite';
import { buildTargets, rendererConfig, ROOT } from '../../electron.config.ts';
import { browserModeMessage, locateElectron, planStart, type StartPlan } from './start-plan.ts';

function electronPackageDir(): string | null {
  try {
    return nodePath.dirname(createRequire(import.meta.url).resolve('electron/package.json'));
  } catch {
    return null;
  }
}

function readText(path: string): string | null {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return null;
  }
}

async function runElectron(plan: Extract<StartPlan, { mode: 'electron' }>): Promise<number> {
  await buildTargets(['renderer', 'main', 'preload']);
  const env = { ...process.env };
  delete env['ELECTRON_RUN_AS_NODE'];
  const child = spawn(plan.binary, plan.args, { stdio: 'inherit', env });
  const forward = (signal: NodeJS.Signals): void => {
    child.kill(signal);
  };
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  return new Promise((resolve) => child.on('exit', (code) => resolve(code ?? 0)));
}

async function runBrowser(plan: Extract<StartPlan, { mode: 'browser' }>): Promise<number> {
  await buildTargets(['renderer']);
  const server = await preview({ ...rendererConfig(), preview: { ...rendererConfig().preview, host: plan.host, port: plan.port, strictPort: false, open: false } });
  const url = server.resolvedUrls?.local[0] ?? `http://${plan.host}:${plan.port}/`;
  for (const line of browserModeMessage(url, plan.reason)) console.log(line);
  return new Promise((resolve) => {
    const stop = (): void => {
      void server.close().finally(() => resolve(0));
    };
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  });
}

async function start(): Promise<number> {
  const packageDir = electronPackageDir();
  const runtime = locateElectron({
    packageDir,
    readPathFile: () => (packageDir ? readText(nodePath.join(packageDir, 'path.txt')) : null),
    exists: existsSync,
    env: process.env,
  });
  const plan = planStart({ runtime, platform: process.platform, env: process.env, appRoot: ROOT, args: process.argv.slice(2) });
  return plan.mode === 'electron' ? runElectron(plan) : runBrowser(plan);
}

start().then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    console.error(`npm start failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  },
);
