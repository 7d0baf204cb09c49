// The Outbox's list side: its title and a line on where the mail comes from, then the list or its state.
import type { ReactNode } from 'react';
import { ListPane } from '@/components/inventory/list-pane';

export function OutboxPane({ children }: { children: ReactNode }) {
  return (
    <ListPane title="Outbox" hint="Every e-mail the local mail sink received. Nothing here left this machine." testID="outbox-pane">
      {children}
    </ListPane>
  );
}

/** The message id in an Outbox path (/outbox/42), or null on the list itself. */
export function outboxIdFromPath(pathname: string): number | null {
  const match = /^\/outbox\/(\d+)/.exec(pathname);
  return match ? Number(match[1]) : null;
}
