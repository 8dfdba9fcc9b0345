import { z } from "zod";

// Bodies of the case API, shared by the server routes and the browser's own calls.
const uuid = (what: string) => z.uuid({ message: `${what} is not a valid id` });

export const ObservationBody = z.object({
  symptomId: uuid("symptomId"),
  present: z.boolean({ message: "present must be true or false" }),
  source: z.enum(["owner", "technician"]).default("technician"),
  note: z.string().trim().max(500).optional(),
});

export const FindingBody = z
  .object({
    checkId: uuid("checkId"),
    result: z.enum(["pass", "fail"]).optional(),
    reading: z.string().trim().min(1).max(60).optional(),
    note: z.string().trim().max(500).optional(),
  })
  .refine((b) => b.result || b.reading, {
    message: "Give a result (pass or fail) or a reading with its unit",
  });

export type ObservationInput = z.infer<typeof ObservationBody>;
export type FindingInput = z.infer<typeof FindingBody>;
