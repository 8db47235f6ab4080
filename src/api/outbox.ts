import type { OutboxRow } from '../../shared/schemas/signoff';
import { apiGet, apiPost } from './client';

export interface OutboxList {
  messages: OutboxRow[];
  /** False when the server has no mail transport: messages stay pending. */
  delivering: boolean;
}

export const listOutbox = () => apiGet<OutboxList>('/api/outbox');

/** Puts a message back in the queue and tries it now. */
export const retryOutboxMessage = (id: number) => apiPost<OutboxRow>(`/api/outbox/${id}/retry`);
