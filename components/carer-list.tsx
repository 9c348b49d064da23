import type { CarerLink } from "@/db/schema";

const consentWords: Record<CarerLink["consentMethod"], string> = {
  "in-app": "agreed in Rampline",
  verbal: "agreed in person or by phone",
  written: "agreed in writing",
};

export function CarerList({ carers, clientName }: { carers: CarerLink[]; clientName: string }) {
  if (carers.length === 0) {
    return <p className="text-ink-soft">No carers are linked to {clientName} yet.</p>;
  }
  return (
    <ul className="flex flex-col gap-3">
      {carers.map((carer) => (
        <li key={carer.id} className="border-b border-line-soft pb-2">
          <span className="font-bold">{carer.carerName}</span> · {carer.relationship}
          <span className="block text-sm text-ink-soft">
            {carer.carerEmail} · {carer.carerUserId ? "Account active" : "Invitation sent"} · consent{" "}
            {consentWords[carer.consentMethod]}
          </span>
        </li>
      ))}
    </ul>
  );
}
