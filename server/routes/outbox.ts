// Outbox (admin): what the local SMTP sink received — GET /api/outbox, /api/outbox/:id, /api/outbox/:id/raw.
// Tenant users get 404 (the Outbox does not exist for them); other roles without admin get 403.
import express, { type Router } from 'express';
import { outboxIdParamSchema, outboxListQuerySchema, outboxListSchema, outboxMessageSchema } from '../../shared/outbox';
import { ADMIN_ROLES } from '../../shared/permissions';
import { staffOnlyRoute } from '../auth/guards';
import { domainError } from '../errors';
import { parseSinkMessage } from '../mail/parse-message';
import { getSinkMessage, listSinkMessages, type SinkMessageRow } from '../queries/mail/sink-messages';
import type { RouteDeps } from './deps';

export class OutboxMessageNotFoundError extends domainError('MESSAGE_NOT_FOUND', 404,
  (id: number) => `No message ${id} in the outbox.`) {}

export function outboxRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.use(...staffOnlyRoute(...ADMIN_ROLES));

  const load = async (rawId: unknown): Promise<SinkMessageRow> => {
    const { id } = outboxIdParamSchema.parse({ id: rawId });
    const row = await getSinkMessage(db, id);
    if (!row) throw new OutboxMessageNotFoundError(id);
    return row;
  };

  router.get('/', async (req, res) => {
    const query = outboxListQuerySchema.parse(req.query);
    const { items, total } = await listSinkMessages(db, query);
    res.json(outboxListSchema.parse({ items, total, page: query.page, pageSize: query.pageSize }));
  });

  router.get('/:id', async (req, res) => {
    const row = await load(req.params.id);
    const parsed = await parseSinkMessage(row.raw);
    res.json(outboxMessageSchema.parse({
      id: row.id,
      receivedAt: row.receivedAt.toISOString(),
      sizeBytes: row.sizeBytes,
      envelope: { from: row.envelopeFrom, to: row.envelopeTo },
      ...parsed,
    }));
  });

  router.get('/:id/raw', async (req, res) => {
    const row = await load(req.params.id);
    res.type('message/rfc822').attachment(`outbox-${row.id}.eml`).send(row.raw);
  });

  return router;
}
