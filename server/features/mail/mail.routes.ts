/**
 * `GET /api/dev/mail`: what the local mail catcher received, newest first (`?to=` filters by
 * recipient). Mounted only outside production, and only when the app runs a catcher.
 */
import { z } from 'zod';
import type { RouteDef } from '../../auth/access.ts';
import type { MailCatcher } from '../../fakes/mailCatcher.ts';

const query = z.strictObject({ to: z.string().max(254).optional() });

export function mailRoutes(mailbox: MailCatcher): RouteDef[] {
  return [
    {
      method: 'get',
      path: '/dev/mail',
      access: { kind: 'public' },
      handler: (req, res) => {
        const { to } = query.parse(req.query);
        res.json({ messages: mailbox.messages(to) });
      },
    },
  ];
}
