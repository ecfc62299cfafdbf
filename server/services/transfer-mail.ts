import type { DataSource } from 'typeorm';
import { formatCount } from '../../shared/format';
import { TRANSFER_STATE_LABELS, type TransferState } from '../../shared/schemas/locations';
import { escapeHtml, type OutgoingMail } from '../mail/mailer';
import { findTransfer } from '../repositories/transfers.repository';

/** The message to the requesting clerk for a step of their transfer; null when the transfer is gone. */
export async function transferMail(ds: DataSource, transferId: string, state: TransferState, link: string): Promise<OutgoingMail | null> {
  const t = await findTransfer(ds.manager, transferId);
  if (!t) return null;
  const what = `${formatCount(t.quantity)} × ${t.brand} ${t.part_number} from ${t.from_name} to ${t.to_name}`;
  const label = TRANSFER_STATE_LABELS[state].toLowerCase();
  const why = state === 'refused' && t.refusal_reason ? `\nReason: ${t.refusal_reason}` : '';
  return {
    to: t.requester_email,
    subject: `Transfer ${label}: ${t.brand} ${t.part_number}`,
    text: `Hello ${t.requester_name},\n\nyour transfer of ${what} is ${label}.${why}\n\n${link}\n`,
    html: `<p>Hello ${escapeHtml(t.requester_name)},</p><p>your transfer of ${escapeHtml(what)} is <b>${escapeHtml(label)}</b>.</p>${
      why ? `<p>Reason: ${escapeHtml(t.refusal_reason ?? '')}</p>` : ''
    }<p><a href="${escapeHtml(link)}">${escapeHtml(link)}</a></p>`,
  };
}
