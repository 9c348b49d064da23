"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { sendJson } from "@/lib/api-client";

export function TherapistActiveToggle({ memberId, name, active }: { memberId: string; name: string; active: boolean }) {
  const router = useRouter();
  const mutation = useMutation({
    mutationFn: () => sendJson("PATCH", `/api/team/members/${encodeURIComponent(memberId)}`, { active: !active }),
    onSuccess: () => router.refresh(),
  });
  return (
    <div className="flex flex-col items-end gap-1">
      <Button
        variant={active ? "secondary" : "primary"}
        busy={mutation.isPending}
        aria-label={`${active ? "Deactivate" : "Reactivate"} ${name}`}
        onClick={() => {
          if (!active || window.confirm(`Deactivate ${name}? They will be signed out and unable to sign in.`)) mutation.mutate();
        }}
      >
        {active ? "Deactivate" : "Reactivate"}
      </Button>
      {mutation.error ? (
        <p role="alert" className="text-sm font-bold text-blocks">
          {mutation.error.message}
        </p>
      ) : null}
    </div>
  );
}
