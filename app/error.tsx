"use client";
import { useEffect } from "react";
import { Button } from "@/components/ui/button";

// Shown when a screen fails to load. Nothing about the failure is revealed beyond a reference for support.
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="mx-auto max-w-lg px-5 py-12" role="alert">
      <h1 className="text-2xl">Something went wrong</h1>
      <p className="mt-3 text-ink-soft">
        This page could not be shown. Nothing you had already saved is lost. Try again, and if it keeps happening tell
        your clinic{error.digest ? ` (reference ${error.digest})` : ""}.
      </p>
      <Button className="mt-6" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
