import type { DataSource } from 'typeorm';
import { formatMoney, formatPercentChange } from '../../../shared/format';
import { escapeHtml, type OutgoingMail } from '../../mail/mailer';
import { largestFlaggedMoves } from '../../repositories/price-list-rows.repository';
import { committedSummary } from '../../repositories/price-lists.repository';
import { buyerEmails } from '../../repositories/users.repository';

/** Flagged moves listed in the message; the rest are on the Price lists page. */
const MAX_LISTED = 20;

const pct = (v: number | null): string => (v === null ? '—' : formatPercentChange(v));

/**
 * The summary of a committed list for the buyers, rendered by the mail job from what the commit
 * stored; null when no buyer can sign in.
 */
export async function priceListSummaryMail(ds: DataSource, listId: string, link: string): Promise<OutgoingMail | null> {
  const to = await buyerEmails(ds.manager);
  if (to.length === 0) return null;
  const facts = await committedSummary(ds.manager, listId);
  if (!facts) throw new Error(`price list ${listId} is not committed`);
  const { counts, applied } = facts;
  const moves = await largestFlaggedMoves(ds.manager, listId, MAX_LISTED);

  const subject = `Price list committed: ${facts.supplier_name} — ${counts.new} new, ${counts.changed} changed, ${facts.flagged} flagged`;
  const lines = [
    `${facts.committed_by_name ?? 'A buyer'} committed ${facts.file_name} from ${facts.supplier_name}.`,
    '',
    `Lines: ${counts.total}. New parts: ${counts.new}. Price changes: ${counts.changed} (${counts.firstPrices} first prices). ` +
      `Unchanged: ${counts.unchanged}. Rejected: ${counts.rejected}. Supersessions linked: ${applied.supersessionsLinked}.`,
    `Moves above ${facts.flag_threshold_pct ?? '—'} %: ${facts.flagged}.`,
    ...moves.map(
      (m) =>
        `  ${m.brand} ${m.part_number}: cost ${formatMoney(m.old_cost_cents)} → ${formatMoney(m.cost_cents)} (${pct(m.cost_change_pct)}), ` +
        `list ${formatMoney(m.old_list_cents)} → ${formatMoney(m.list_cents)} (${pct(m.list_change_pct)})`,
    ),
    ...(facts.flagged > moves.length ? [`  … and ${facts.flagged - moves.length} more.`] : []),
    '',
    `File SHA-256: ${facts.sha256}`,
    `Details: ${link}`,
  ];
  const rows = moves
    .map(
      (m) =>
        `<tr><td>${escapeHtml(`${m.brand} ${m.part_number}`)}</td><td>${formatMoney(m.old_cost_cents)} → ${formatMoney(m.cost_cents)}</td>` +
        `<td>${pct(m.cost_change_pct)}</td><td>${formatMoney(m.old_list_cents)} → ${formatMoney(m.list_cents)}</td><td>${pct(m.list_change_pct)}</td></tr>`,
    )
    .join('');
  const html =
    `<p>${escapeHtml(lines[0] ?? '')}</p><p>${escapeHtml(lines[2] ?? '')}<br>${escapeHtml(lines[3] ?? '')}</p>` +
    (rows ? `<table><tr><th>Part</th><th>Cost</th><th></th><th>List</th><th></th></tr>${rows}</table>` : '') +
    `<p>File SHA-256: <code>${escapeHtml(facts.sha256)}</code><br><a href="${escapeHtml(link)}">Open the price list</a></p>`;
  return { to, subject, text: lines.join('\n'), html };
}
