import { z } from 'zod';
import { TRANSFER_STATE_LABELS, transferStateSchema } from '../../shared/schemas/locations';
import { appUrl } from '../config/env';
import { transferMail } from '../services/transfer-mail';
import { defineJob } from './job';

/** Tells the clerk who asked for a transfer that it moved on: the worker renders it from PostgreSQL. */
const payloadSchema = z.object({ transferId: z.string().uuid(), state: transferStateSchema });

export const mailTransferJob = defineJob({
  schema: payloadSchema,
  batchSize: 1,
  policy: 'standard',
  expireInSeconds: 120,
  summarize: (p) => `Transfer ${TRANSFER_STATE_LABELS[p.state].toLowerCase()} e-mail to the requester`,
  async handle(deps, payloads) {
    for (const p of payloads) {
      const mail = await transferMail(deps.dataSource, p.transferId, p.state, `${appUrl(deps.env)}/transfers`);
      if (mail) await deps.mailer.send(mail);
    }
  },
});
