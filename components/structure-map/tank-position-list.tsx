import type { TTankPosition } from "@/lib/structure/position";

const ROWS: [keyof TTankPosition, string, string][] = [
  ["midship", "In the midship region", "Outside the midship region"],
  ["nearEngineRoom", "Next to the engine-room forward bulkhead", "Away from the engine-room forward bulkhead"],
  ["forwardRegion", "In the forward region", "Aft of the forward region"],
  ["forwardOfCollisionBulkhead", "At or forward of the collision bulkhead", "Aft of the collision bulkhead"],
];

/** What the product derives from the frames, each with the reason beside it. */
export function TankPositionList({ position }: { position: TTankPosition }) {
  return (
    <dl className="space-y-1 text-sm">
      {ROWS.map(([key, yes, no]) => (
        <div key={key} className="grid gap-x-3 sm:grid-cols-[18rem_1fr]">
          <dt className={position[key].applies ? "font-semibold text-hull-900" : "text-slate-600"}>
            {position[key].applies ? "✔ " : "– "}
            {position[key].applies ? yes : no}
          </dt>
          <dd className="text-slate-700">{position[key].why}</dd>
        </div>
      ))}
    </dl>
  );
}
