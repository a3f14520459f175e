import { useSyncExternalStore } from 'react';
import { documentSession } from './session';

const LABEL = {
  idle: '',
  kept: 'Kept in this browser',
  pending: 'Keeping…',
  failed: 'Not kept in this browser',
} as const;

/** Whether the open design is in browser storage yet: a small word in the toolbar. */
export function StorageStatus() {
  const status = useSyncExternalStore(
    (listener) => documentSession.onStatus(listener),
    () => documentSession.status,
  );
  return (
    <span
      className={`storage-status ${status}`}
      data-testid="storage-status"
      data-status={status}
      title={LABEL[status] || undefined}
    >
      {LABEL[status]}
    </span>
  );
}
