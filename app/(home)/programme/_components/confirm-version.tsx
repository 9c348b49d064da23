"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { sendJson } from "@/lib/api-client";

// Saying the stimulator now matches the version in force; until someone does, session logs ask which settings were used.
export function ConfirmVersion({ clientId, versionNumber }: { clientId: string; versionNumber: number }) {
  const router = useRouter();
  const mutation = useMutation({
    mutationFn: () => sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/programme/confirmations`, { versionNumber }),
    onSuccess: () => router.refresh(),
  });
  return (
    <Card title={`Set your stimulator to version ${versionNumber}`}>
      <p className="mb-4">
        Change the settings on your stimulator to match the ones below, following its instructions, with the strength at
        zero. Then tell your therapist it is done.
      </p>
      <Button type="button" large busy={mutation.isPending} onClick={() => mutation.mutate()}>
        My stimulator now matches version {versionNumber}
      </Button>
      {mutation.error ? (
        <p role="alert" className="mt-2 font-bold text-blocks">
          {mutation.error.message}
        </p>
      ) : null}
    </Card>
  );
}
