// The life of a lot on the floor: open → in progress → complete, or scrapped
// before it completes. Which moves exist is LOT_STATUS_MOVES in shared/ (the
// server refuses any other with 409 'wrong_state'); here are the words and
// colours of the screens, which ask before the moves that cannot be taken back.
import { LOT_STATUS_MOVES, type LotStatus } from '../../../shared/schemas/lots';

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
export const isFinal = (status: LotStatus) => LOT_STATUS_MOVES[status].length === 0;

/** Lots still on the floor (the Bench's "Lots in flight"). */
export const isInFlight = (status: LotStatus) => status === 'open' || status === 'in_progress';
