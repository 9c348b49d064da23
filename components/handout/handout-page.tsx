import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { HandoutDocument, type HandoutProps } from "./handout-document";
import { PrintButton } from "./print-button";

export function HandoutPage({ data, backHref, backLabel, pdfHref }: { data: HandoutProps | null; backHref: string; backLabel: string; pdfHref: string }) {
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <Link href={backHref}>← {backLabel}</Link>
        {data ? (
          <div className="flex flex-wrap gap-3">
            <PrintButton />
            <a href={pdfHref} className="inline-flex min-h-11 items-center rounded-md border-2 border-ink px-4 font-bold no-underline">
              Download as PDF
            </a>
          </div>
        ) : null}
      </div>
      {data ? (
        <HandoutDocument {...data} />
      ) : (
        <EmptyState title="No handout yet">The handout appears once a programme has been published.</EmptyState>
      )}
    </div>
  );
}
