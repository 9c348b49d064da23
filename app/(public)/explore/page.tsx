import type { Metadata } from "next";
import { ExploreCautions } from "./_components/explore-cautions";
import { ExploreWorkbench } from "./_components/explore-workbench";

export const metadata: Metadata = {
  title: "Settings explorer",
  description: "See what one channel's stimulation settings give: the cycle, the pulse, the figures and the findings.",
};

// Public and data-free (the analysis runs in the browser), so it needs no loading.tsx or error.tsx of its own.
export default function ExplorePage() {
  return (
    <div className="flex flex-col gap-8">
      <div className="flex max-w-3xl flex-col gap-3">
        <h1 className="text-4xl">Settings explorer</h1>
        <p className="text-lg text-ink-soft">
          Enter one channel&apos;s settings to see the on/off cycle, the shape of one pulse, the figures that follow from
          them, and findings from published sources and common practice. Nothing you enter is saved or sent anywhere:
          the analysis runs in your browser.
        </p>
        <p className="text-ink-soft">
          &ldquo;Blocks publishing&rdquo; marks settings Rampline would not let a therapist publish in a programme.
        </p>
      </div>
      <ExploreCautions />
      <ExploreWorkbench />
    </div>
  );
}
