import { WarningTriangle } from "../priority";

// Cautions shown with a check, in a form that cannot be missed. They point to the maker's
// procedure and local rules: Ramplight suggests; a qualified person decides.
export const CAUTION_TEXT: Record<string, string> = {
  lifting: "Lifting: use the maker's lift points, axle stands or a locked ramp; never work under a car held only by a jack.",
  hot_parts: "Hot parts: exhaust, engine and brakes stay hot long after a drive. Let them cool or wear gloves.",
  fuel: "Fuel: no flames or sparks; relieve system pressure by the maker's procedure; have an extinguisher to hand.",
  brake_hydraulics: "Brake hydraulics: follow the maker's bleeding procedure; fluid damages paint and eyes. Test the pedal before the car moves.",
  airbag: "Airbags: disconnect the battery and wait the maker's stated time before working near airbag parts.",
  high_voltage: "High voltage: only trained and authorised people work on orange-cabled systems, with the maker's isolation procedure.",
  rotating_parts: "Rotating parts: keep hands, hair and clothing clear of belts, fans and wheels that can turn.",
  pressurised_cooling: "Cooling system under pressure: never open a hot filler cap; let the engine cool first.",
  exhaust_fumes: "Exhaust fumes: run engines only with extraction or outdoors.",
  battery_acid: "Battery: acid and explosive gas; eye protection, no sparks, disconnect the negative first.",
};

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
          <li key={c}>{CAUTION_TEXT[c] ?? c}</li>
        ))}
      </ul>
      <p className="mt-1 text-sm text-graphite-600">Follow the vehicle maker's procedure and local regulations.</p>
    </div>
  );
}
