import { describe, expect, it } from 'vitest';
import { outboxSummary } from '../../src/lib/outbox/outbox-summary';
import type { OutboxItem } from '../../src/lib/outbox/outbox-items';

const item = (kind: OutboxItem['kind'], state: OutboxItem['state'] = 'waiting') =>
  ({ id: Math.random().toString(36), createdAt: 0, state, kind }) as OutboxItem;

describe('outboxSummary', () => {
  it('counts waiting flags and marks (an undo counts as a mark) and the refused apart', () => {
    const items = [item('flag'), item('flag'), item('mark'), item('unmark'), item('mark'), item('flag', 'refused')];
    expect(outboxSummary(items)).toEqual({ waiting: '2 flags and 3 marks waiting to send', refused: 1 });
  });

  it('says nothing waits when only refused items are left', () => {
    expect(outboxSummary([item('mark', 'refused')])).toEqual({ waiting: null, refused: 1 });
  });
});
