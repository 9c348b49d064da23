"use client";

export default function GlobalError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en-GB">
      <body style={{ fontFamily: "sans-serif", padding: 32, background: "#f7f2e8", color: "#1b2633" }}>
        <h1>Rampline could not load</h1>
        <p>Please try again in a moment. Nothing you had already saved is lost.</p>
        <button onClick={reset} style={{ minHeight: 44, padding: "0 16px", fontWeight: 700 }}>
          Try again
        </button>
      </body>
    </html>
  );
}
