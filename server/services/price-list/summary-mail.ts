import type { DataSource } from 'typeorm';
import { formatMoney, formatPercentChange } from '../../../shared/format';
import type { PriceListApplied, PriceListCounts } from '../../../shared/schemas/price-lists';
import { escapeHtml, type OutgoingMail } from '../../mail/mailer';

/** Flagged moves listed in the message; the rest are on the Price lists page. */
const MAX_LISTED = 20;

interface FlaggedMove {
  part_number: string;
  brand: string;
  old_cost_cents: number;
  cost_cents: number;
  old_list_cents: number;
  list_cents: number;
  cost_change_pct: number | null;
  list_change_pct: number | null;
}

interface ListFacts {
  counts: PriceListCounts;
  applied: PriceListApplied;
  supplier_name: string;
  file_name: string;
  sha256: string;
  committed_by_name: string | null;
  flagged: number;
  flag_threshold_pct: number | null;
}

const pct = (v: number | null): string => (v === null ? '—' : formatPercentChange(v));

/** Every buyer who can sign in: the people who keep supplier prices. */
async function buyerEmails(ds: DataSource): Promise<string[]> {
  const rows = (await ds.query(`SELECT email FROM "user" WHERE role = 'buyer' AND NOT disabled ORDER BY email`)) as { email: string }[];
  return rows.map((r) => r.email);
}

/**
 * The summary of a committed list for the buyers, rendered by the mail job from what the commit
 * stored; null when no buyer can sign in.
 */
export async function priceListSummaryMail(ds: DataSource, listId: string, link: string): Promise<OutgoingMail | null> {
  const to = await buyerEmails(ds);
  if (to.length === 0) return null;
  const facts = (
    (await ds.query(
      `SELECT pl.counts, pl.applied, s.name AS supplier_name, pl.file_name, pl.sha256, u.name AS committed_by_name, pl.flagged,
              pl.flag_threshold_pct
         FROM price_list pl JOIN supplier s ON s.id = pl.supplier_id LEFT JOIN "user" u ON u.id = pl.committed_by
        WHERE pl.id = $1 AND pl.status = 'committed'`,
      [listId],
    )) as ListFacts[]
  )[0];
  if (!facts) throw new Error(`price list ${listId} is not committed`);
  const { counts, applied } = facts;
  const moves = (await ds.query(
    `SELECT part_number, brand, old_cost_cents, cost_cents, old_list_cents, list_cents, cost_change_pct, list_change_pct
       FROM price_list_row WHERE price_list_id = $1 AND flagged ORDER BY greatest(abs(cost_change_pct), abs(list_change_pct)) DESC, line LIMIT $2`,
    [listId, MAX_LISTED],
  )) as FlaggedMove[];

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
