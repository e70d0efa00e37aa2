"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";

/** The new key's secret, shown this one time, with a copy button. */
export function SecretOnce({ secret }: { secret: string }) {
  const [copied, setCopied] = useState<"no" | "yes" | "failed">("no");
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-800">
        Copy the key now and store it in your secrets manager. <strong>It will not be shown again</strong>; only its
        first characters stay visible in the list.
      </p>
      <div className="flex items-stretch gap-2">
        <input
          readOnly
          aria-label="New API key"
          data-testid="new-key-secret"
          value={secret}
          onFocus={(e) => e.currentTarget.select()}
          className="min-w-0 flex-1 rounded-md border border-ink-200 bg-ink-50 px-2 py-1.5 font-mono text-xs text-ink-900"
        />
        <Button
          variant="secondary"
          size="sm"
          onClick={async () => {
            try {
              await navigator.clipboard.writeText(secret);
              setCopied("yes");
            } catch {
              setCopied("failed");
            }
          }}
        >
          {copied === "yes" ? "Copied" : "Copy"}
        </Button>
      </div>
      <p aria-live="polite" className="text-xs text-ink-600">
        {copied === "yes" ? "Copied to the clipboard." : copied === "failed" ? "The browser refused the clipboard; select the text and copy it by hand." : ""}
      </p>
    </div>
  );
}
