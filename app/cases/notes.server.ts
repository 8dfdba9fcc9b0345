import { sql } from "drizzle-orm";
import { auditLog, cases, users } from "~/db/schema";

// The latest word between an apprentice and a senior, where the other person looks for it: the
// apprentice's question (while the case waits for a senior) and the senior's note at sign-off or
// send-back. Both are in the audit row written with the change, so they are read from there.
export type NoteRow = { note: string; by: string | null; at: string };
export const latestNote = (actions: string[]) => sql<NoteRow | null>`(
  select json_build_object('note', ${auditLog.after}->>'note', 'by', ${users.name}, 'at', ${auditLog.at})
  from ${auditLog} left join ${users} on ${users.id} = ${auditLog.actorUserId}
  where ${auditLog.workshopId} = ${cases.workshopId} and ${auditLog.entity} = 'case' and ${auditLog.entityId} = ${cases.id}::text
    and ${auditLog.action} in (${sql.raw(actions.map((a) => `'${a}'`).join(", "))}) and coalesce(${auditLog.after}->>'note', '') <> ''
  order by ${auditLog.at} desc, ${auditLog.id} desc
  limit 1
)`;
