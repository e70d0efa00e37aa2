"use client";
import { ErrorState } from "@/components/ui/states";

// A page that failed on the server: say so, offer a retry, and give the digest to quote to support.
export default function ConsoleError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="max-w-xl">
      <ErrorState title="This page could not be loaded" onRetry={reset}>
        Nothing was changed. Try again in a moment; if it keeps failing, quote
        {error.digest ? <> the reference <code className="text-xs">{error.digest}</code></> : " the time"} to your administrator.
      </ErrorState>
    </div>
  );
}
