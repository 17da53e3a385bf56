import { execFileSync, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync, chownSync } from 'node:fs';
import { join } from 'node:path';
import { Client } from 'pg';
import { log } from './log';

/**
 * A private PostgreSQL cluster on loopback, one per profile, under a
 * directory the `postgres` user can reach (a checkout under /root is not).
 * initdb and pg_ctl refuse to run as root, so they run as `postgres`.
 */
export type Cluster = { dataDir: string; port: number; startedHere: boolean; /** Set when the cluster asks for a password (production). */ password?: string };

/**
 * How a private cluster is run. Durability is on (fsync) everywhere but the
 * throw-away test cluster; production asks for a password (scram-sha-256),
 * development trusts loopback connections, as a developer's own machine may.
 */
export type ClusterPolicy = { fsync: boolean; password: boolean };

function pgBin(): string {
  for (const v of ['17', '16', '15']) {
    const dir = `/usr/lib/postgresql/${v}/bin`;
    if (existsSync(join(dir, 'pg_ctl'))) return dir;
  }
  return '';
}

function ensureServerInstalled(): string {
  let bin = pgBin();
  if (bin) return bin;
  log('postgres', 'PostgreSQL server not found: installing Debian package postgresql');
  execFileSync('bash', ['-c', 'apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null'], { stdio: 'inherit' });
  // Debian's package starts its own cluster on 5432; we do not use it.
  spawnSync('bash', ['-c', 'pg_ctlcluster --force 15 main stop 2>/dev/null || true']);
  bin = pgBin();
  if (!bin) throw new Error('PostgreSQL server binaries are still missing after apt-get install postgresql');
  return bin;
}

function asPostgres(bin: string, args: string[], cwd: string): ReturnType<typeof spawnSync> {
  return spawnSync('runuser', ['-u', 'postgres', '--', join(bin, args[0]!), ...args.slice(1)], { cwd, encoding: 'utf8' });
}

function pidAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  // A killed postmaster can linger as a zombie: alive to kill(0), dead in fact.
  const stat = existsSync(`/proc/${pid}/stat`) ? readFileSync(`/proc/${pid}/stat`, 'utf8') : '';
  const state = stat.split(') ')[1]?.charAt(0);
  return state !== undefined && state !== 'Z' && state !== 'X';
}

function clearStaleLock(dataDir: string, port: number): void {
  const pidFile = join(dataDir, 'postmaster.pid');
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, 'utf8').split('\n')[0]);
  if (Number.isFinite(pid) && pid > 0 && pidAlive(pid)) return;
  log('postgres', `removing stale postmaster.pid (pid ${pid} is gone)`);
  rmSync(pidFile, { force: true });
  for (const f of [`.s.PGSQL.${port}`, `.s.PGSQL.${port}.lock`]) rmSync(join(dataDir, f), { force: true });
}

function isRunning(bin: string, dataDir: string): boolean {
  return asPostgres(bin, ['pg_ctl', 'status', '-D', dataDir], '/').status === 0;
}

/** The password of a cluster made with `password: true`, readable by root only. */
const passwordFile = (base: string): string => join(base, 'postgres-password');

function initCluster(bin: string, base: string, dataDir: string, port: number, policy: ClusterPolicy): void {
  log('postgres', `initdb ${dataDir}${policy.password ? ' (password authentication)' : ''}`);
  rmSync(dataDir, { recursive: true, force: true });
  const auth = ['-A', 'trust'];
  if (policy.password) {
    // initdb reads the password from a file the postgres user can read; it is removed at once.
    const pw = randomBytes(24).toString('base64url');
    writeFileSync(passwordFile(base), `${pw}\n`, { mode: 0o600 });
    const once = join(base, '.initdb-pw');
    writeFileSync(once, `${pw}\n`, { mode: 0o600 });
    chownSync(once, uid('postgres'), gid('postgres'));
    auth.splice(0, 2, '-A', 'scram-sha-256', `--pwfile=${once}`);
  }
  const r = asPostgres(bin, ['initdb', '-D', dataDir, '-U', 'postgres', ...auth, '-E', 'UTF8', '--locale=C.UTF-8'], '/');
  rmSync(join(base, '.initdb-pw'), { force: true });
  if (r.status !== 0) throw new Error(`initdb failed: ${String(r.stderr)}`);
  writeConf(dataDir, { listen_addresses: `'127.0.0.1'`, port: String(port), unix_socket_directories: `'${dataDir}'`, max_connections: '200' });
}

/** Sets `key = value` lines in the cluster's postgresql.auto.conf (read at every start), keeping the others. */
function writeConf(dataDir: string, settings: Record<string, string>): void {
  const conf = join(dataDir, 'postgresql.auto.conf');
  const kept = (existsSync(conf) ? readFileSync(conf, 'utf8') : '').split('\n')
    .filter((l) => l !== '' && !Object.keys(settings).some((k) => new RegExp(`^${k}\\s*=`).test(l)));
  writeFileSync(conf, [...kept, ...Object.entries(settings).map(([k, v]) => `${k} = ${v}`), ''].join('\n'));
  chownSync(conf, uid('postgres'), gid('postgres'));
}

/** Start (or reuse) the cluster; idempotent and safe after a crash. */
export function ensureCluster(root: string, profile: string, port: number, policy: ClusterPolicy): Cluster {
  const bin = ensureServerInstalled();
  const base = join(root, profile);
  const dataDir = join(base, 'pgdata');
  mkdirSync(base, { recursive: true, mode: 0o755 });
  execFileSync('chown', ['postgres:postgres', root, base]);
  if (!existsSync(join(dataDir, 'PG_VERSION'))) initCluster(bin, base, dataDir, port, policy);
  const password = existsSync(passwordFile(base)) ? readFileSync(passwordFile(base), 'utf8').trim() : undefined;
  if (policy.password && !password) throw new Error(`the cluster in ${dataDir} was made without a password (a development cluster?): give production its own PG_DATA_ROOT`);
  // Durability is decided at every start: a cluster made by an older version with fsync off gets it back.
  const durable = policy.fsync ? 'on' : 'off';
  writeConf(dataDir, { fsync: durable, synchronous_commit: durable, full_page_writes: durable });
  clearStaleLock(dataDir, port);
  if (isRunning(bin, dataDir)) {
    // postmaster.pid's fourth line is the port the running server listens on.
    const running = Number(readFileSync(join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[3]);
    if (running !== port) throw new Error(`the cluster in ${dataDir} is already running on port ${running}, not PG_PORT=${port}: stop it (pg_ctl stop -D ${dataDir}) or set PG_PORT=${running}`);
    // Settings written above take effect at its next restart; a running server keeps its own.
    return { dataDir, port, startedHere: false, password };
  }
  // The port asked for now wins over the one written when the cluster was made (PG_PORT may have changed since).
  writeConf(dataDir, { port: String(port) });
  const r = asPostgres(bin, ['pg_ctl', 'start', '-w', '-t', '60', '-D', dataDir, '-l', join(base, 'postgres.log')], '/');
  if (r.status !== 0) throw new Error(`PostgreSQL did not start (see ${join(base, 'postgres.log')}): ${String(r.stderr || r.stdout)}`);
  log('postgres', `listening on 127.0.0.1:${port}${policy.fsync ? '' : ' (fsync off: a throw-away test cluster)'}`);
  return { dataDir, port, startedHere: true, password };
}

/** The connection string of a private cluster's database, with its password when it has one. */
export function clusterUrl(cluster: Cluster, database: string): string {
  const user = cluster.password ? `postgres:${encodeURIComponent(cluster.password)}` : 'postgres';
  return `postgres://${user}@127.0.0.1:${cluster.port}/${database}`;
}

export function stopCluster(cluster: Cluster): void {
  const bin = pgBin();
  if (bin) asPostgres(bin, ['pg_ctl', 'stop', '-m', 'fast', '-D', cluster.dataDir], '/');
}

/**
 * Stops or starts a private cluster as an operator would (`pg_ctl … -m fast`
 * disconnects every client at once): the fault tests and the soak benchmark
 * use it to prove the stack rides through a database restart.
 */
export function controlCluster(dataDir: string, action: 'stop' | 'start'): void {
  const bin = pgBin();
  if (!bin) throw new Error('PostgreSQL server binaries not found');
  const args = action === 'stop' ? ['pg_ctl', 'stop', '-m', 'fast', '-w', '-D', dataDir] : ['pg_ctl', 'start', '-w', '-t', '60', '-D', dataDir, '-l', join(dataDir, '..', 'postgres.log')];
  const r = asPostgres(bin, args, '/');
  if (r.status !== 0) throw new Error(`pg_ctl ${action} failed: ${String(r.stderr || r.stdout)}`);
}

function uid(name: string): number {
  return Number(execFileSync('id', ['-u', name], { encoding: 'utf8' }).trim());
}
function gid(name: string): number {
  return Number(execFileSync('id', ['-g', name], { encoding: 'utf8' }).trim());
}

/** Create the database if missing; with `fresh`, drop it first (test runs). */
export async function ensureDatabase(cluster: Cluster, name: string, fresh = false): Promise<void> {
  const client = new Client({ connectionString: clusterUrl(cluster, 'postgres') });
  await client.connect();
  try {
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${quoteIdent(name)} WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${quoteIdent(name)}`);
  } finally {
    await client.end();
  }
}

function quoteIdent(name: string): string {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`database name ${name} must be lower-case letters, digits and _`);
  return `"${name}"`;
}
