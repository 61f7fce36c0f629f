import { useCallback, useState } from 'react';
import type { JarRowDto } from '../../../shared/schemas/jars';
import type { ShelfMark } from '../../../shared/schemas/jar-shelf';

export interface WalkMark {
  jarId: number;
  label: string;
  mark: ShelfMark;
  /** The outbox item (and Idempotency-Key) that carries the mark. */
  key: string;
}

export interface Walk {
  room: string;
  shelf: string;
  /** The shelf as it stood when the walk began: marking a jar colonised must not shift the rest. */
  jars: Pick<JarRowDto, 'id' | 'label' | 'grain' | 'cultureCode' | 'parentJarLabel' | 'shelfPosition'>[];
  index: number;
  marks: WalkMark[];
}

const storageKey = 'asepta-shelf-walk';

function read(): Walk | null {
  try {
    const raw = localStorage.getItem(storageKey);
    return raw ? (JSON.parse(raw) as Walk) : null;
  } catch {
    return null;
  }
}

/** The walk in progress, kept on the phone so leaving the screen (or a reload) never loses the place. */
export function useWalk(): [Walk | null, (next: Walk | null) => void] {
  const [walk, setWalk] = useState<Walk | null>(read);
  const save = useCallback((next: Walk | null) => {
    if (next) localStorage.setItem(storageKey, JSON.stringify(next));
    else localStorage.removeItem(storageKey);
    setWalk(next);
  }, []);
  return [walk, save];
}
