import type { ReactNode } from "react";
import { cn } from "./cn";

type Tone = "neutral" | "accent" | "pass" | "marginal" | "fail";

const TONES: Record<Tone, string> = {
  neutral: "border-ink-200 bg-ink-50 text-ink-600",
  accent: "border-lumen-100 bg-lumen-50 text-lumen-700",
  pass: "border-verdict-pass/30 bg-verdict-pass/10 text-verdict-pass",
  marginal: "border-verdict-marginal/30 bg-verdict-marginal/10 text-verdict-marginal",
  fail: "border-verdict-fail/30 bg-verdict-fail/10 text-verdict-fail",
};

export function Badge({ tone = "neutral", children, className }: { tone?: Tone; children: ReactNode; className?: string }) {
  return (
    <span className={cn("inline-flex items-center rounded border px-1.5 py-0.5 text-xs font-medium", TONES[tone], className)}>
      {children}
    </span>
  );
}
