import { WarningTriangle } from "../priority";

import { CAUTION_TEXT } from "~/domain/knowledge";

// Cautions shown with a check, in a form that cannot be missed (the words are in app/domain).
export function Cautions({ cautions }: { cautions: string[] }) {
  if (cautions.length === 0) return null;
  return (
    <div role="note" aria-label="Cautions" className="mt-2 rounded-lg border-2 border-soon bg-card p-3">
      <p className="flex items-center gap-2 font-semibold">
        <WarningTriangle className="h-5 w-5" />
        Take care
      </p>
      <ul className="mt-1 list-disc pl-6 text-sm">
        {cautions.map((c) => (
          <li key={c}>{CAUTION_TEXT[c as keyof typeof CAUTION_TEXT] ?? c}</li>
        ))}
      </ul>
      <p className="mt-1 text-sm text-graphite-600">
        Follow the vehicle maker's procedure and local regulations.
      </p>
    </div>
  );
}
