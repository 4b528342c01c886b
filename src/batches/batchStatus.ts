import type { BatchStatus } from '../../shared/schemas/batches';

export const STATUS_LABEL: Record<BatchStatus, string> = {
  in_storage: 'In storage',
  planted_out: 'Planted out',
  discarded: 'Discarded',
};
