import type { DataSource } from 'typeorm';
import { INVITE_TTL_HOURS } from '../../shared/schemas/auth';
import { escapeHtml, type OutgoingMail } from '../mail/mailer';
import { reissueInvitationToken } from '../repositories/invitations.repository';
import { inviteTokenHash, newInviteToken } from './invite-token';

/**
 * The invitation e-mail, rendered by the mail job. The link's token is issued here and only its
 * hash stored, so the token is written nowhere but in the message (not in the job's payload).
 * Each attempt issues a new token, so only the link that was delivered last works; an invitation
 * used or expired meanwhile gets no mail (null).
 */
export async function issueInvitationMail(ds: DataSource, invitationId: string, appUrl: string): Promise<OutgoingMail | null> {
  const token = newInviteToken();
  const invitee = await reissueInvitationToken(ds.manager, invitationId, inviteTokenHash(token));
  if (!invitee) return null;
  const link = `${appUrl}/accept-invite?token=${encodeURIComponent(token)}`;
  return {
    to: invitee.email,
    subject: 'You are invited to Arcwise',
    text: `Hello ${invitee.name},\n\nyou have been invited to Arcwise as ${invitee.role}. Set your password here (the link works once, for ${INVITE_TTL_HOURS} hours):\n\n${link}\n`,
    html: `<p>Hello ${escapeHtml(invitee.name)},</p><p>you have been invited to Arcwise as <b>${escapeHtml(invitee.role)}</b>. Set your password here (the link works once, for ${INVITE_TTL_HOURS} hours):</p><p><a href="${escapeHtml(link)}">${escapeHtml(link)}</a></p>`,
  };
}
