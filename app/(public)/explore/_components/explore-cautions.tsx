import { Notice } from "@/components/ui/notice";

// The usual cautions, shown before anyone reads a figure: the explorer describes settings, it does not approve them.
export function ExploreCautions() {
  return (
    <div className="flex flex-col gap-4">
      <Notice tone="warning" word="Cautions" title="Before stimulating anyone">
        <ul className="mt-1 list-disc pl-5">
          <li>Never place electrodes over the front of the neck, across the chest, or over broken or inflamed skin.</li>
          <li>Start at zero and turn the amplitude up slowly.</li>
          <li>Stop at once on pain or burning, and check the skin.</li>
        </ul>
      </Notice>
      <p className="max-w-3xl">
        This explorer does not replace the device manufacturer&apos;s instructions or the treating clinician&apos;s
        judgement. It shows what a set of settings gives and where they sit against published figures and the
        trade&apos;s rules of thumb; it does not decide whether they suit anyone. Settings are chosen by the treating
        clinician, following the manufacturer&apos;s instructions, local regulations and licensed practice.
      </p>
    </div>
  );
}
