#!/usr/bin/env node
// Entry point of `npm start`, `npm run dev` and `npm test`. Plain JavaScript
// on purpose: it runs before node_modules exists, installs it (npm ci) when
// missing or out of date with package-lock.json, then hands over to the
// TypeScript orchestrators through tsx.
'use strict';
const { spawnSync, spawn } = require('node:child_process');
const { createHash } = require('node:crypto');
const { existsSync, readFileSync, writeFileSync } = require('node:fs');
const { join } = require('node:path');

const root = join(__dirname, '..', '..');
const targets = { start: ['server/ops/start.ts'], dev: ['server/ops/start.ts', '--dev'], test: ['tests/run-all.ts'], workers: ['server/ops/workers.ts'] };
const [command, ...rest] = process.argv.slice(2);
if (!targets[command]) {
  console.error(`usage: node server/ops/launch.js ${Object.keys(targets).join('|')} [args]`);
  process.exit(2);
}

const lockHash = createHash('sha1').update(readFileSync(join(root, 'package-lock.json'))).digest('hex');
const stamp = join(root, 'node_modules', '.frostgrade-lock-sha1');
const installed = existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === lockHash;
if (!installed) {
  console.log('[setup] node_modules missing or older than package-lock.json: running npm ci (a few minutes the first time)');
  // Use the npm that launched us: a dependency's own `npm` in node_modules/.bin
  // must never shadow it.
  const npmCli = process.env.npm_execpath;
  const [cmd, args] = npmCli ? [process.execPath, [npmCli]] : ['npm', []];
  const r = spawnSync(cmd, [...args, 'ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
  writeFileSync(stamp, `${lockHash}\n`);
}

const child = spawn(join(root, 'node_modules', '.bin', 'tsx'), [...targets[command], ...rest], { cwd: root, stdio: 'inherit' });
// Ctrl-C reaches the whole process group; the orchestrator shuts its children
// down itself, so this process only waits for it.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => child.kill('SIGTERM'));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
