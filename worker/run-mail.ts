import type { DataSource } from 'typeorm';
import type { Mailer } from '../server/mail/mailer';
import { coolerHeadline } from './cooler-mail';

type Finished = {
  id: string; number: number; kind: 'leg' | 'couple' | 'cascade'; state: string; designId: string | null; designName: string;
  launchedBy: string; error: string | null; result: Record<string, unknown> | null; seconds: number;
};

const k = (v: unknown, digits = 2): string => (typeof v === 'number' && Number.isFinite(v) ? v.toFixed(digits) : '—');

/** Headline numbers of a leg result in the trade's units. */
function headline(result: Record<string, unknown>): string[] {
  const r = result as { deltaT?: number; coldSide?: number; hotSide?: number; current?: number; voltage?: number; power?: number; heatLoad?: number; cop?: number; baselines?: { uniform?: { deltaT?: number }; localBestZt?: { deltaT?: number } | null } };
  return [
    `ΔT ${k(r.deltaT)} K (cold side ${k(r.coldSide)} K, hot side ${k(r.hotSide)} K)`,
    `current ${k(r.current, 3)} A, voltage ${k(r.voltage, 4)} V, input power ${k(r.power, 4)} W`,
    `heat load ${k(r.heatLoad, 4)} W, COP ${k(r.cop, 3)}`,
    `best uniform leg: ΔT ${k(r.baselines?.uniform?.deltaT)} K; local-best-zT leg: ΔT ${k(r.baselines?.localBestZt?.deltaT)} K`,
  ];
}

function cancelNote(run: Finished): string {
  if (run.state !== 'cancelled') return 'The optimisation converged.';
  return run.result ? 'The run was cancelled; this is the best design found before it stopped.' : 'The run was cancelled before its first start finished; there is no design to keep.';
}

const kindWords = { leg: 'Run', couple: 'Matched-couple run', cascade: 'Cascade run' } as const;

/**
 * The launcher and every follower of the design hear how a run ended; a
 * removed member hears nothing. A couple or cascade run (no design, no
 * followers) is mailed to its launcher, naming the cooler, the run's number
 * and its kind.
 */
export async function mailRunFinished(ds: DataSource, mailer: Mailer, appOrigin: string, run: Finished): Promise<void> {
  const rows: Array<{ email: string }> = await ds.query(
    `SELECT DISTINCT u.email FROM app_user u WHERE u.removed_at IS NULL AND (u.id = $1 OR u.id IN (SELECT user_id FROM design_follower WHERE design_id = $2))`,
    [run.launchedBy, run.designId],
  );
  if (rows.length === 0) return;
  const link = `${appOrigin}/runs/${run.id}`;
  const verdict = run.state === 'succeeded' ? 'finished' : run.state;
  const cooler = run.kind === 'leg' ? null : coolerHeadline(run.kind, run.result);
  const numbers = run.result ? (run.kind === 'leg' ? headline(run.result) : cooler?.lines ?? ['The result could not be read; open the run.']) : [];
  const lines = run.state === 'failed' ? [`The run failed: ${run.error ?? 'no reason was recorded'}.`] : [cancelNote(run), '', ...numbers];
  const shown = run.state !== 'failed' && run.result;
  const subject = run.kind === 'leg'
    ? `Run ${verdict}: ${run.designName}${shown ? ` — ΔT ${k((run.result as { deltaT?: number }).deltaT, 1)} K` : ''}`
    : `${kindWords[run.kind]} ${run.number} ${verdict}: ${run.designName}${shown && cooler ? ` — ${cooler.subject}` : ''}`;
  const why = run.kind === 'leg' ? 'you follow this design; unfollow it on its page' : `you launched run ${run.number} of this ${run.kind}`;
  await mailer.send({
    to: rows.map((r) => r.email),
    subject,
    text: [...lines, '', `Time taken: ${run.seconds.toFixed(1)} s.`, `Open it: ${link}`, '',
      'These are model predictions. Measure before relying on them; modules run at high currents and their hot side can burn.',
      '', `— Frostgrade (${why})`].join('\n'),
  });
}
