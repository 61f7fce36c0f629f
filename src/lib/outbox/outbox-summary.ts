import type { OutboxItem } from './outbox-items';
import { countOf } from '../count-text';

/** "2 flags and 3 marks waiting to send" — the line the phone bar shows. */
export function outboxSummary(items: OutboxItem[]): { waiting: string | null; refused: number } {
  const waiting = items.filter((i) => i.state === 'waiting');
  const count = (kinds: OutboxItem['kind'][]) => waiting.filter((i) => kinds.includes(i.kind)).length;
  const parts = [
    count(['flag']) && countOf(count(['flag']), 'flag'),
    count(['photos']) && countOf(count(['photos']), 'set of photos', 'sets of photos'),
    count(['mark', 'unmark']) && countOf(count(['mark', 'unmark']), 'mark'),
  ].filter(Boolean) as string[];
  const list = parts.length > 1 ? `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}` : parts[0];
  return {
    waiting: list ? `${list} waiting to send` : null,
    refused: items.filter((i) => i.state === 'refused').length,
  };
}
