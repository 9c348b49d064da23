import { useId } from "react";
import { PulseDrawing } from "./pulse-drawing";
import { DEFAULT_PULSE_LAYOUT, pulseGeometry, type PulseInput, type PulseLayout } from "./pulse-geometry";

export const PULSE_HEIGHT = 250;
export const pulseLayout = (width: number): PulseLayout => ({ ...DEFAULT_PULSE_LAYOUT, x1: width - 20 });

type PulseSvgProps = { input: PulseInput; title: string; description: string; width: number; className?: string };

export function PulseSvg({ input, title, description, width, className = "" }: PulseSvgProps) {
  const id = useId();
  const layout = pulseLayout(width);
  return (
    <svg viewBox={`0 0 ${width} ${PULSE_HEIGHT}`} className={`h-auto w-full ${className}`} role="img" aria-labelledby={`${id}-title`} aria-describedby={`${id}-desc`}>
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>{description}</desc>
      <PulseDrawing input={input} geometry={pulseGeometry(input, layout)} />
    </svg>
  );
}
