import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { Select } from '../../../components/ui/select';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { jarsQueries } from '../api/jars-queries';

/** Rooms and shelves from the lab's own jars, each with how many jars still incubate there. */
interface Props {
  initial: { room: string; shelf: string };
  onChoose: (room: string, shelf: string) => void;
  busy: boolean;
}

export function ShelfChooser({ initial, onChoose, busy }: Props) {
  const places = useQuery(jarsQueries.shelves());
  const [room, setRoom] = useState(initial.room);
  const [shelf, setShelf] = useState(initial.shelf);
  if (places.isPending) return <Spinner label="Loading the lab’s shelves" />;
  if (places.error)
    return (
      <Notice tone="danger" title="The lab’s shelves could not be loaded.">
        {errorMessage(places.error)}
      </Notice>
    );
  const items = places.data.items;
  if (items.length === 0) return <EmptyState title="No jars are incubating on any shelf." />;
  const rooms = [...new Set(items.map((p) => p.room))];
  const chosenRoom = rooms.includes(room) ? room : rooms[0]!;
  const shelves = items.filter((p) => p.room === chosenRoom);
  const chosenShelf = shelves.some((p) => p.shelf === shelf) ? shelf : shelves[0]!.shelf;
  return (
    <form
      className="grid gap-4 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        onChoose(chosenRoom, chosenShelf);
      }}
    >
      <Select
        label="Room"
        value={chosenRoom}
        onChange={(e) => setRoom(e.target.value)}
        options={rooms.map((r) => ({ value: r, label: r }))}
      />
      <Select
        label="Shelf"
        value={chosenShelf}
        onChange={(e) => setShelf(e.target.value)}
        options={shelves.map((p) => ({ value: p.shelf, label: `${p.shelf} · ${p.incubating} incubating` }))}
      />
      <Button type="submit" className="min-h-14 text-lg" pending={busy}>
        Start the walk
      </Button>
    </form>
  );
}
