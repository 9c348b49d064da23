import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import type { ProgrammeTemplate } from "@/db/schema";
import { BUILT_IN_TEMPLATES } from "@/lib/programmes/templates";

// A new programme starts from one of Rampline's starting points, a clinic template, or blank. Nothing is saved
// until the therapist changes something in the builder.
export function TemplatePicker({ clientId, clinicTemplates }: { clientId: string; clinicTemplates: ProgrammeTemplate[] }) {
  const href = (start: string) => `/clients/${clientId}/programme?start=${encodeURIComponent(start)}`;
  return (
    <div className="flex flex-col gap-6">
      <p className="text-ink-soft">
        Each starting point is built from the usual ranges in practice. It is a place to begin, to adjust for this
        client after screening and the in-clinic test; the amplitude ceiling in particular must be set for them.
      </p>
      <ul className="grid gap-4 md:grid-cols-2">
        {BUILT_IN_TEMPLATES.map((template) => (
          <li key={template.id} className="flex flex-col gap-2 rounded-lg border border-line bg-card p-4">
            <h3 className="text-lg">{template.name}</h3>
            <p className="flex-1 text-ink-soft">{template.description}</p>
            <Link href={href(template.id)} className={buttonClasses("secondary")}>
              Start from “{template.name}”
            </Link>
          </li>
        ))}
        {clinicTemplates.map((template) => (
          <li key={template.id} className="flex flex-col gap-2 rounded-lg border border-line bg-card p-4">
            <h3 className="text-lg">{template.name}</h3>
            <p className="flex-1 text-ink-soft">{template.description ?? "Your clinic's template."}</p>
            <Link href={href(`clinic:${template.id}`)} className={buttonClasses("secondary")}>
              Start from “{template.name}”
            </Link>
          </li>
        ))}
      </ul>
      <div>
        <Link href={href("blank")} className={buttonClasses("quiet")}>
          Start from a blank programme
        </Link>
      </div>
    </div>
  );
}
