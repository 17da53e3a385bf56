import type { DataSource } from 'typeorm';
import type { GrowthMailJob } from '../../shared/api/growth-mail';
import type { Mailer } from './mailer';
import { orderClosedMail } from './templates';

export type GrowthMailDeps = { ds: DataSource; mailer: Mailer; appOrigin: string };

type ClosedOrder = { id: string; team_id: string; batch: string; state: string; close_reason: string | null; design_name: string | null };

/**
 * Who grows a team's orders: orders are not assigned to one person, so every
 * active grower of the team hears the verdict; a team without growers has its
 * admins, who stand in for them (they may take the grower's steps).
 */
async function growersOf(ds: DataSource, teamId: string): Promise<string[]> {
  const rows: Array<{ email: string; role: string }> = await ds.query(
    `SELECT email, role FROM app_user WHERE team_id = $1 AND role IN ('grower', 'admin') AND removed_at IS NULL ORDER BY email`, [teamId]);
  const growers = rows.filter((r) => r.role === 'grower');
  return (growers.length > 0 ? growers : rows).map((r) => r.email);
}

/** A growth-order mail, decided in a worker from the order as stored. */
export async function sendGrowthMail(d: GrowthMailDeps, job: GrowthMailJob): Promise<string> {
  const [o]: ClosedOrder[] = await d.ds.query(
    `SELECT o.id, o.team_id, o.batch, o.state, o.close_reason, r.design_snapshot->>'name' AS design_name
     FROM growth_order o JOIN run r ON r.id = o.run_id WHERE o.id = $1`, [job.orderId]);
  if (!o || (o.state !== 'approved' && o.state !== 'rejected')) return 'order not closed: nothing sent';
  const [closed]: Array<{ by_user: string }> = await d.ds.query(
    `SELECT by_user FROM growth_event WHERE order_id = $1 AND kind = 'closed' ORDER BY at DESC, id DESC LIMIT 1`, [o.id]);
  const to = await growersOf(d.ds, o.team_id);
  if (to.length === 0) return 'no grower or admin in the team: nothing sent';
  await d.mailer.send(orderClosedMail(to, {
    batch: o.batch, designName: o.design_name ?? '', verdict: o.state, reason: o.close_reason ?? '', by: closed?.by_user ?? 'The physicist', link: `${d.appOrigin}/growth/${o.id}`,
  }));
  return `order ${o.state}: ${to.length} ${to.length === 1 ? 'grower' : 'growers'} told`;
}
