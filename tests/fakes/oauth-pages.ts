// HTML for the fake provider's consent screen. Kept apart from the protocol code so each file
// stays readable; every value that came from a request is escaped (state is attacker-controlled).
import type { ServerResponse } from "node:http";
import { DEMO_WORKSHOPS } from "../../seeds/demo/people";
import type { DemoPerson } from "../../seeds/demo/people";
import { escapeHtml, hiddenInputs, sendHtml } from "./http-util";

export const PAGE_TITLE = "Fake sign-in provider (local demo only)";

export type ConsentFields = {
  client_id: string;
  redirect_uri: string;
  state: string;
  scope?: string;
  code_challenge?: string;
  code_challenge_method?: string;
};

function workshopLabel(person: DemoPerson): string {
  if (person.workshop === null) return "no workshop yet";
  return DEMO_WORKSHOPS[person.workshop]?.name ?? person.workshop;
}

export function renderConsent(res: ServerResponse, fields: ConsentFields, users: DemoPerson[]): void {
  const hidden = hiddenInputs(fields);
  const userForms = users
    .map((person) => {
      const details = [`@${person.login}`, person.role ?? "no role", workshopLabel(person)].join(" · ");
      return `<li><form method="post" action="/login/oauth/authorize">
${hidden}
<input type="hidden" name="login" value="${escapeHtml(person.login)}">
<button type="submit"><strong>${escapeHtml(person.name)}</strong><br><span>${escapeHtml(details)}</span></button>
</form></li>`;
    })
    .join("\n");
  const scope = fields.scope ? `<p>Requested scope: <code>${escapeHtml(fields.scope)}</code></p>` : "";
  sendHtml(
    res,
    200,
    PAGE_TITLE,
    `<h1>${PAGE_TITLE}</h1>
<p>The application <code>${escapeHtml(fields.client_id)}</code> asks who you are. Pick an invented demo person to sign in as.</p>
${scope}
<ul aria-label="Demo people" style="list-style:none;padding:0">
${userForms}
</ul>
<form method="post" action="/login/oauth/authorize">
${hidden}
<input type="hidden" name="decision" value="deny">
<button type="submit">Deny</button>
</form>`,
  );
}

// Shown instead of redirecting: RFC 6749 §4.1.2.1 forbids redirecting to an unverified URI.
export function renderAuthorizeError(res: ServerResponse, message: string): void {
  sendHtml(
    res,
    400,
    PAGE_TITLE,
    `<h1>Sign-in request refused</h1>
<p role="alert">${escapeHtml(message)}</p>
<p>Nothing was sent back to the application.</p>`,
  );
}

// A stand-in avatar so the demo never fetches images from the internet.
export function avatarSvg(person: DemoPerson): string {
  const initials = person.name
    .split(/\s+/)
    .map((part) => part[0] ?? "")
    .join("")
    .slice(0, 2)
    .toUpperCase();
  return `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96" role="img" aria-label="${escapeHtml(person.name)}">
<rect width="96" height="96" fill="#3b5b7a"/>
<text x="48" y="58" font-family="sans-serif" font-size="36" fill="#fff" text-anchor="middle">${escapeHtml(initials)}</text>
</svg>`;
}
