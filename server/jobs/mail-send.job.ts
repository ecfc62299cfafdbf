import { z } from 'zod';
import { appUrl } from '../config/env';
import type { OutgoingMail } from '../mail/mailer';
import { FitReportService } from '../services/compat/fit-reports.service';
import { issueInvitationMail } from '../services/invitation-mail';
import { priceListSummaryMail } from '../services/price-list/summary-mail';
import { defineJob, type JobDeps } from './job';

const uuid = z.string().uuid();

/** Which message, by kind and ids: the worker renders it from PostgreSQL when it sends it. */
const mailPayloadSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('invitation'), invitationId: uuid }),
  z.object({ kind: z.literal('fit-report'), fitReportId: uuid, senderId: uuid, to: z.email() }),
  z.object({ kind: z.literal('price-list-summary'), priceListId: uuid }),
]);
type MailPayload = z.infer<typeof mailPayloadSchema>;

/** null: nothing to send any more (an invitation used meanwhile, no buyer to tell). */
function render(deps: JobDeps, mail: MailPayload): Promise<OutgoingMail | null> {
  const base = appUrl(deps.env);
  switch (mail.kind) {
    case 'invitation':
      return issueInvitationMail(deps.dataSource, mail.invitationId, base);
    case 'fit-report':
      return new FitReportService(deps.dataSource, base).mail(mail.fitReportId, mail.senderId, mail.to);
    case 'price-list-summary':
      return priceListSummaryMail(deps.dataSource, mail.priceListId, `${base}/price-lists/${mail.priceListId}`);
  }
}

const SUMMARIES: Record<MailPayload['kind'], string> = {
  invitation: 'Invitation e-mail',
  'fit-report': 'Fit report e-mail',
  'price-list-summary': 'Price-list summary e-mail to the buyers',
};

export const mailSendJob = defineJob({
  schema: mailPayloadSchema,
  // One message an attempt: a refused message must not fail (and resend) the others.
  batchSize: 1,
  policy: 'standard',
  expireInSeconds: 120,
  summarize: (mail) => (mail.kind === 'fit-report' ? `${SUMMARIES[mail.kind]} to ${mail.to}` : SUMMARIES[mail.kind]),
  async handle(deps, payloads) {
    for (const payload of payloads) {
      const mail = await render(deps, payload);
      if (mail) await deps.mailer.send(mail);
    }
  },
});
