import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { VIEWS, markerZone, zonesForView, type ElectrodeIndex, type Marker } from "@/lib/placement";
import { VIEW_NAMES, letterOf } from "./marker-text";

/**
 * The keyboard and screen-reader way to place an electrode: choose a zone by name, place it there, then
 * fine-tune it on the drawing with the arrow keys. Also moves a placed electrode to another zone or view.
 */
export function PlaceControls({ electrode, marker, onPlace, onRemove }: { electrode: ElectrodeIndex; marker: Marker | null; onPlace: (zoneId: string) => void; onRemove: () => void }) {
  const id = useId();
  const [zoneId, setZoneId] = useState(() => (marker ? (markerZone(marker)?.id ?? "") : ""));
  const letter = letterOf(electrode);
  const verb = marker ? "Move" : "Place";
  return (
    <div className="flex flex-wrap items-end gap-2 pl-10">
      <div className="flex w-full min-w-0 flex-col gap-1 sm:w-auto sm:max-w-full">
        <label htmlFor={id} className="text-sm font-bold">
          {verb} electrode {letter} on
        </label>
        <select
          id={id}
          value={zoneId}
          onChange={(event) => setZoneId(event.target.value)}
          className="min-h-11 w-full min-w-0 rounded-md border-2 border-ink bg-card px-2"
        >
          <option value="" disabled>
            Choose a part of the body
          </option>
          {VIEWS.map((view) => (
            <optgroup key={view} label={VIEW_NAMES[view]}>
              {zonesForView(view).map((zone) => (
                <option key={zone.id} value={zone.id}>
                  {zone.label}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
      </div>
      <Button type="button" variant="secondary" disabled={zoneId === ""} onClick={() => onPlace(zoneId)}>
        {verb} electrode {letter}
      </Button>
      {marker ? (
        <Button type="button" variant="quiet" onClick={onRemove}>
          Remove electrode {letter}
        </Button>
      ) : null}
    </div>
  );
}
