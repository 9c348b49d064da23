import type { Electrode } from "./schema-electrodes";
import { toCm } from "./units";

/** Conductive area of one electrode, in cm² (round π(d/2)², square s², rectangle w·l). */
export function electrodeAreaCm2(electrode: Electrode): number {
  switch (electrode.shape) {
    case "round": {
      const radius = toCm(electrode.diameter, electrode.unit) / 2;
      return Math.PI * radius * radius;
    }
    case "square": {
      const side = toCm(electrode.side, electrode.unit);
      return side * side;
    }
    case "rectangle":
      return toCm(electrode.width, electrode.unit) * toCm(electrode.length, electrode.unit);
  }
}

/**
 * The smallest conductive area among a channel's electrodes, in cm². Density figures use it because the same
 * current crosses both electrodes, so the smaller one carries the higher density.
 */
export function smallestElectrodeAreaCm2(electrodes: readonly Electrode[]): number {
  return Math.min(...electrodes.map(electrodeAreaCm2));
}
