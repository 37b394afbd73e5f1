import { AddRoomForm } from "./add-room-form";
import { RoomRow } from "./room-row";

type Props = { projectId: string; rooms: { id: string; name: string }[] };

/** The project's rooms in order, each renamed, moved or removed in place, and "Add room" below. */
export function ProjectRooms({ projectId, rooms }: Props) {
  return (
    <div className="flex flex-col gap-4">
      {rooms.length === 0 ? (
        <p className="text-ink-soft">No rooms yet.</p>
      ) : (
        <ul className="divide-y divide-line">
          {rooms.map((room, index) => (
            <RoomRow key={room.id} projectId={projectId} room={room} index={index} count={rooms.length} />
          ))}
        </ul>
      )}
      <p className="text-sm text-ink-soft">A room with boards, decisions or fixed items can&apos;t be removed until they are moved or removed.</p>
      <div className="border-t border-line pt-4">
        <AddRoomForm projectId={projectId} />
      </div>
    </div>
  );
}
