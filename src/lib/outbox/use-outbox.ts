import { useEffect, useState } from 'react';
import type { OutboxItem } from './outbox-items';
import { onProgress, progressOf } from './outbox-progress';
import { listItems, onOutboxChange } from './outbox-store';

/** The queue as it stands, kept current as items are added, sent or refused (in any tab). */
export function useOutbox(): { items: OutboxItem[] | undefined; progress: (id: string) => number | undefined } {
  const [items, setItems] = useState<OutboxItem[]>();
  const [, setTick] = useState(0);
  useEffect(() => {
    let live = true;
    const load = () =>
      void listItems().then(
        (all) => live && setItems(all),
        () => live && setItems([]),
      );
    load();
    const offChange = onOutboxChange(load);
    const offProgress = onProgress(() => setTick((t) => t + 1));
    return () => {
      live = false;
      offChange();
      offProgress();
    };
  }, []);
  return { items, progress: progressOf };
}
