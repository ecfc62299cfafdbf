import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { checkLabel, type CompatSettings } from '../../../shared/compat';
import type { User } from '../../../shared/schemas/auth';
import { CAUTIONS } from '../../../shared/schemas/compat';
import type { FitReportBody } from '../../../shared/schemas/fit-reports';
import { AppError } from '../../errors';
import type { JobQueue } from '../../jobs/queue';
import { escapeHtml, type OutgoingMail } from '../../mail/mailer';
import { presentCoilComparison, presentPlugComparison } from '../../presenters/compat.presenter';
import { presentFitReport, type FitReportRecord } from '../../presenters/fit-report.presenter';
import { audit } from '../audit.service';
import { compareCoilRequest, comparePlugRequest } from './compare.service';

const SELECT = `SELECT r.id, r.kind, r.title, r.notes, r.inputs, r.result, r.verdict, r.share_token, r.created_at, r.shop_id,
                       u.name AS created_by_name, s.name AS shop_name
                  FROM fit_report r JOIN "user" u ON u.id = r.created_by LEFT JOIN shop s ON s.id = r.shop_id`;

/** A technician sees only its own shop's reports; the store's staff see every report. */
function visibleTo(user: User, r: { shop_id: string | null }): boolean {
  return user.role !== 'technician' || (r.shop_id !== null && r.shop_id === user.shopId);
}

export class FitReportService {
  constructor(
    private readonly ds: DataSource,
    private readonly appUrl: string,
  ) {}

  /** The verdict is recomputed here from the inputs: a client's verdict is never trusted. */
  async create(user: User, body: FitReportBody, settings: CompatSettings): Promise<FitReportRecord> {
    // The report keeps the result as it was shown that day: later changes to the model or the settings do not rewrite it.
    const result =
      body.kind === 'coil'
        ? presentCoilComparison(await compareCoilRequest(this.ds, body.inputs, settings))
        : presentPlugComparison(await comparePlugRequest(this.ds, body.inputs, settings));
    const token = randomBytes(24).toString('base64url');
    const title = body.title?.trim() || `${result.substitute.label} for ${result.original.label} on ${result.engine.label.split(' — ')[0]}`;
    const id = await this.ds.transaction(async (m) => {
      const rows = (await m.query(
        `INSERT INTO fit_report (kind, title, notes, inputs, result, verdict, share_token, created_by, shop_id)
         VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9) RETURNING id`,
        [
          body.kind,
          title,
          body.notes ?? '',
          JSON.stringify(body.inputs),
          JSON.stringify(result),
          result.verdict,
          token,
          user.id,
          user.shopId,
        ],
      )) as { id: string }[];
      await audit(m, {
        actorId: user.id,
        action: 'fit-report.create',
        entityType: 'fit_report',
        entityId: rows[0]!.id,
        data: { verdict: result.verdict },
      });
      return rows[0]!.id;
    });
    return this.get(user, id);
  }

  async list(user: User): Promise<FitReportRecord[]> {
    return (await this.ds.query(`${SELECT} WHERE ($1::uuid IS NULL OR r.shop_id = $1) ORDER BY r.created_at DESC LIMIT 200`, [
      user.role === 'technician' ? user.shopId : null,
    ])) as FitReportRecord[];
  }

  async get(user: User, id: string): Promise<FitReportRecord> {
    const rows = (await this.ds.query(`${SELECT} WHERE r.id = $1`, [id])) as FitReportRecord[];
    const r = rows[0];
    // Another shop's report is "not found", so its existence does not leak.
    if (!r || !visibleTo(user, r)) throw AppError.notFound('Fit report');
    return r;
  }

  async getShared(token: string): Promise<FitReportRecord> {
    const rows = (await this.ds.query(`${SELECT} WHERE r.share_token = $1`, [token])) as FitReportRecord[];
    if (!rows[0]) throw AppError.notFound('Fit report');
    return rows[0];
  }

  /** Checks the sender may see the report, then queues the e-mail with its audit row. */
  async email(user: User, id: string, to: string, jobs: JobQueue): Promise<void> {
    await this.get(user, id);
    await this.ds.transaction(async (m) => {
      await audit(m, { actorId: user.id, action: 'fit-report.email', entityType: 'fit_report', entityId: id, data: { to } });
      await jobs.enqueue(m, 'mail.send', { kind: 'fit-report', fitReportId: id, to, senderId: user.id });
    });
  }

  /** The message, rendered by the mail job from PostgreSQL (the sender's right to it was checked when it was queued). */
  async mail(id: string, senderId: string, to: string): Promise<OutgoingMail> {
    const rows = (await this.ds.query(`${SELECT} WHERE r.id = $1`, [id])) as FitReportRecord[];
    const senders = (await this.ds.query(`SELECT name FROM "user" WHERE id = $1`, [senderId])) as { name: string }[];
    if (!rows[0] || !senders[0]) throw new Error(`fit report ${id} or its sender ${senderId} is gone`);
    const report = presentFitReport(rows[0], this.appUrl);
    const sender = senders[0].name;
    const lines = report.result.checks.map((c) => `  ${c.verdict.toUpperCase().padEnd(6)} ${checkLabel(c.id)}: ${c.reason}`).join('\n');
    const htmlRows = report.result.checks
      .map(
        (c) => `<tr><td><b>${escapeHtml(c.verdict)}</b></td><td>${escapeHtml(checkLabel(c.id))}</td><td>${escapeHtml(c.reason)}</td></tr>`,
      )
      .join('');
    return {
      to,
      subject: `Fit report: ${report.title} — ${report.verdict}`,
      text: `${sender} sent you a fit report from Arcwise.\n\n${report.title}\nOverall verdict: ${report.verdict}\n\n${lines}\n\nOpen it: ${report.shareUrl}\n\n${CAUTIONS.join('\n')}\n`,
      html: `<p>${escapeHtml(sender)} sent you a fit report from Arcwise.</p><h2>${escapeHtml(report.title)}</h2><p>Overall verdict: <b>${escapeHtml(report.verdict)}</b></p><table>${htmlRows}</table><p><a href="${escapeHtml(report.shareUrl)}">${escapeHtml(report.shareUrl)}</a></p><p><small>${CAUTIONS.map(escapeHtml).join('<br>')}</small></p>`,
    };
  }
}
