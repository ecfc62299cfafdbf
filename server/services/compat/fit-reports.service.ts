import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { checkLabel } from '../../../shared/compat';
import type { User } from '../../../shared/schemas/auth';
import { CAUTIONS } from '../../../shared/schemas/compat';
import type { SideLabel } from '../../../shared/schemas/compat';
import type { FitReportBody, FitReportPrice, FitReportsQuery } from '../../../shared/schemas/fit-reports';
import { AppError } from '../../errors';
import type { JobQueue } from '../../jobs/queue';
import { escapeHtml, type OutgoingMail } from '../../mail/mailer';
import { presentCoilComparison, presentPlugComparison } from '../../presenters/compat.presenter';
import { presentFitReport, type FitReportRecord } from '../../presenters/fit-report.presenter';
import { sellPriceRow } from '../../presenters/stock-price.presenter';
import { audit } from '../../repositories/audit.repository';
import {
  findFitReport,
  findFitReportByToken,
  insertFitReport,
  listFitReports,
  setFitReportArchived,
  type FitReportRow,
} from '../../repositories/fit-reports.repository';
import { pricesOf } from '../../repositories/prices.repository';
import { findUser } from '../../repositories/users.repository';
import { getSettings } from '../settings.service';
import { compareCoilsOn, comparePlugsOn } from './compare.service';

/** The list shows this many reports, newest first. */
const LIST_LIMIT = 200;

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
  async create(user: User, body: FitReportBody): Promise<FitReportRecord> {
    const { compat: settings } = await getSettings(this.ds);
    const ex = this.ds.manager;
    // The report keeps the result as it was shown that day: later changes to the model or the settings do not rewrite it.
    const result =
      body.kind === 'coil'
        ? presentCoilComparison(await compareCoilsOn(ex, body.inputs, settings))
        : presentPlugComparison(await comparePlugsOn(ex, body.inputs, settings));
    const token = randomBytes(24).toString('base64url');
    const prices = await this.sellPrices(result);
    const title = body.title?.trim() || `${result.substitute.label} for ${result.original.label} on ${result.engine.label.split(' — ')[0]}`;
    const id = await this.ds.transaction(async (m) => {
      const reportId = await insertFitReport(m, {
        kind: body.kind,
        title,
        notes: body.notes ?? '',
        inputs: body.inputs,
        result,
        shareToken: token,
        createdBy: user.id,
        shopId: user.shopId,
        vehicle: body.vehicle ? { ...body.vehicle, engine: body.vehicle.engine ?? result.engine.label } : null,
        prices,
      });
      await audit(m, {
        actorId: user.id,
        action: 'fit-report.create',
        entityType: 'fit_report',
        entityId: reportId,
        data: { verdict: result.verdict },
      });
      return reportId;
    });
    return this.get(user, id);
  }

  /** The sell price of each side that is a catalog part with a supplier price, as the rule picks it today. */
  private async sellPrices(result: { original: SideLabel; substitute: SideLabel }): Promise<FitReportPrice[]> {
    const sides = (['original', 'substitute'] as const).flatMap((side) => {
      const { partId, label } = result[side];
      return partId ? [{ side, partId, label }] : [];
    });
    const prices = await pricesOf(
      this.ds.manager,
      sides.map((s) => s.partId),
    );
    return sides.flatMap((s) => {
      const row = sellPriceRow(prices.get(s.partId) ?? []);
      return row ? [{ ...s, listCents: row.listCents, coreCents: row.coreCents }] : [];
    });
  }

  list(user: User, query: FitReportsQuery): Promise<FitReportRow[]> {
    return listFitReports(this.ds.manager, {
      shopId: user.role === 'technician' ? user.shopId : null,
      q: query.q,
      includeArchived: query.archived === 'include',
      limit: LIST_LIMIT,
    });
  }

  private async record(row: FitReportRow): Promise<FitReportRecord> {
    return { row, store: (await getSettings(this.ds)).store };
  }

  private async visible(user: User, id: string): Promise<FitReportRow> {
    const r = await findFitReport(this.ds.manager, id);
    // Another shop's report is "not found", so its existence does not leak.
    if (!r || !visibleTo(user, r)) throw AppError.notFound('Fit report');
    return r;
  }

  async get(user: User, id: string): Promise<FitReportRecord> {
    return this.record(await this.visible(user, id));
  }

  async getShared(token: string): Promise<FitReportRecord> {
    const r = await findFitReportByToken(this.ds.manager, token);
    if (!r) throw AppError.notFound('Fit report');
    return this.record(r);
  }

  /** Archives (hidden from the list; the share link still opens it) or restores a report. */
  async setArchived(user: User, id: string, archived: boolean): Promise<FitReportRecord> {
    await this.visible(user, id);
    await this.ds.transaction(async (m) => {
      await setFitReportArchived(m, id, archived);
      await audit(m, {
        actorId: user.id,
        action: archived ? 'fit-report.archive' : 'fit-report.restore',
        entityType: 'fit_report',
        entityId: id,
        data: {},
      });
    });
    return this.get(user, id);
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
    const row = await findFitReport(this.ds.manager, id);
    const senderUser = await findUser(this.ds.manager, senderId);
    if (!row || !senderUser) throw new Error(`fit report ${id} or its sender ${senderId} is gone`);
    const report = presentFitReport(await this.record(row), this.appUrl);
    const sender = senderUser.name;
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
