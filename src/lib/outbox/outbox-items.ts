import type { CreateIncidentInput } from '../../../shared/schemas/incidents';
import type { ShelfMark } from '../../../shared/schemas/jar-shelf';

/** A photo kept on the phone until the server has stored it; the key makes its upload idempotent. */
export interface OutboxPhoto {
  key: string;
  name: string;
  blob: Blob;
  photoId?: number;
}

export type OutboxState = 'waiting' | 'refused';

interface Base {
  /** Also the Idempotency-Key of the item's final write. */
  id: string;
  createdAt: number;
  state: OutboxState;
  /** Why the server refused it, in its own words; shown until the item is fixed or discarded. */
  reason?: string;
  /** The field the refusal names, when it names one (e.g. jarLabels.0). */
  reasonField?: string;
}

export interface FlagItem extends Base {
  kind: 'flag';
  input: Omit<CreateIncidentInput, 'photoIds'>;
  photos: OutboxPhoto[];
}

export interface PhotosItem extends Base {
  kind: 'photos';
  incidentId: number;
  photos: OutboxPhoto[];
}

export interface MarkItem extends Base {
  kind: 'mark';
  jarId: number;
  label: string;
  mark: ShelfMark;
}

export interface UnmarkItem extends Base {
  kind: 'unmark';
  markId: string;
  label: string;
}

export type OutboxItem = FlagItem | PhotosItem | MarkItem | UnmarkItem;

/** Keys without crypto.randomUUID, which a phone only offers on HTTPS pages. */
export function newKey(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}

export function describeItem(item: OutboxItem): string {
  switch (item.kind) {
    case 'flag':
      return `Flag of ${item.input.jarLabels?.join(', ') ?? 'a jar'}${item.photos.length ? ` with ${item.photos.length} photo${item.photos.length > 1 ? 's' : ''}` : ''}`;
    case 'photos':
      return `${item.photos.length} photo${item.photos.length > 1 ? 's' : ''} for incident ${item.incidentId}`;
    case 'mark':
      return `${item.label} marked ${item.mark}`;
    case 'unmark':
      return `Undo of the mark on ${item.label}`;
  }
}
