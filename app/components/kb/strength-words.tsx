// The scale of words for a link's strength with the figure each stands for, beside the links a
// senior may change, so nobody has to remember which word is which.
import { STRENGTHS } from "~/domain/link-strength";

export function StrengthWords() {
  return (
    <section aria-labelledby="words" className="card">
      <h2 id="words" className="text-lg font-semibold">
        The words for strength
      </h2>
      <ul className="tabular mt-1 grid grid-cols-2 gap-1 text-sm sm:grid-cols-3">
        {STRENGTHS.map((s) => (
          <li key={s.word}>
            {s.word}: {Math.round(s.p * 100)}%
          </li>
        ))}
      </ul>
    </section>
  );
}
