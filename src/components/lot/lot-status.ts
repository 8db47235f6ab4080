// The life of a lot on the floor: open → in progress → complete, or scrapped
// before it completes. The server stores any status; the screens offer only
// these moves, and ask before the ones that cannot be taken back.
import type { LotStatus } from '../../../shared/schemas/lots';

export const LOT_NEXT: Record<LotStatus, readonly LotStatus[]> = {
  open: ['in_progress', 'scrapped'],
  in_progress: ['complete', 'scrapped'],
  complete: [],
  scrapped: [],
};

/** The button that moves a lot into a status. */
export const LOT_MOVE_LABELS: Record<LotStatus, string> = {
  open: 'Reopen',
  in_progress: 'Start run',
  complete: 'Mark complete',
  scrapped: 'Scrap lot',
};

export const LOT_STATUS_SEVERITY: Record<LotStatus, 'info' | 'warn' | 'success' | 'danger'> = {
  open: 'info',
  in_progress: 'warn',
  complete: 'success',
  scrapped: 'danger',
};

/** Moves that end the lot's run; they are confirmed first. */
export const isFinal = (status: LotStatus) => LOT_NEXT[status].length === 0;

/** Lots still on the floor (the Bench's "Lots in flight"). */
export const isInFlight = (status: LotStatus) => status === 'open' || status === 'in_progress';
