// Just enough MIME (RFC 5322 / 2045 / 2047) to read back what nodemailer sends: folded headers,
// encoded-word subjects, multipart bodies, base64 and quoted-printable. Not a general parser:
// attachments are skipped and nested message/rfc822 parts are not unpacked.

export type ParsedMail = {
  headers: Record<string, string>; // lower-case names, first occurrence, encoded words decoded
  text: string | null;
  html: string | null;
};

function splitHeadersAndBody(raw: string): { head: string; body: string } {
  const match = /\r?\n\r?\n/.exec(raw);
  if (!match) return { head: raw, body: "" };
  return { head: raw.slice(0, match.index), body: raw.slice(match.index + match[0].length) };
}

function parseHeaders(head: string): Record<string, string> {
  const headers: Record<string, string> = {};
  const unfolded = head.replace(/\r?\n[ \t]+/g, " ");
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    if (!(name in headers)) headers[name] = decodeWords(line.slice(colon + 1).trim());
  }
  return headers;
}

function decodeCharset(bytes: Uint8Array, charset: string): string {
  try {
    return new TextDecoder(charset || "utf-8").decode(bytes);
  } catch {
    return new TextDecoder("utf-8").decode(bytes);
  }
}

function qpToBytes(input: string, underscoreIsSpace: boolean): Uint8Array {
  const text = input.replace(/=\r?\n/g, ""); // soft line breaks
  const bytes: number[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    const hex = text.slice(i + 1, i + 3);
    if (ch === "=" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else if (ch === "_" && underscoreIsSpace) {
      bytes.push(0x20);
    } else {
      bytes.push(...Buffer.from(ch, "utf8"));
    }
  }
  return Uint8Array.from(bytes);
}

// RFC 2047 encoded words, e.g. =?UTF-8?Q?Gr=C3=BC=C3=9Fe?= ; whitespace between two words is dropped.
export function decodeWords(value: string): string {
  return value
    .replace(/(=\?[^?]+\?[BbQq]\?[^?]*\?=)\s+(?==\?)/g, "$1")
    .replace(
      /=\?([^?*]+)(?:\*[^?]+)?\?([BbQq])\?([^?]*)\?=/g,
      (_all, charset: string, enc: string, data: string) => {
        const bytes = enc.toUpperCase() === "B" ? Buffer.from(data, "base64") : qpToBytes(data, true);
        return decodeCharset(bytes, charset);
      },
    );
}

function headerParams(value: string): { value: string; params: Record<string, string> } {
  const [first, ...rest] = value.split(";");
  const params: Record<string, string> = {};
  for (const part of rest) {
    const eq = part.indexOf("=");
    if (eq < 0) continue;
    params[part.slice(0, eq).trim().toLowerCase()] = part
      .slice(eq + 1)
      .trim()
      .replace(/^"(.*)"$/, "$1");
  }
  return { value: (first ?? "").trim().toLowerCase(), params };
}

function decodeBody(body: string, encoding: string, charset: string): string {
  const enc = encoding.toLowerCase();
  if (enc === "base64") return decodeCharset(Buffer.from(body.replace(/\s+/g, ""), "base64"), charset);
  if (enc === "quoted-printable") return decodeCharset(qpToBytes(body, false), charset);
  return body;
}

function walk(raw: string, found: { text: string | null; html: string | null }): Record<string, string> {
  const { head, body } = splitHeadersAndBody(raw);
  const headers = parseHeaders(head);
  const type = headerParams(headers["content-type"] ?? "text/plain");
  const disposition = headerParams(headers["content-disposition"] ?? "inline").value;
  if (type.value.startsWith("multipart/") && type.params.boundary) {
    const marker = `--${type.params.boundary}`;
    const sections = body.split(marker).slice(1); // before the first marker is the preamble
    for (const section of sections) {
      if (section.startsWith("--")) break; // closing marker
      walk(section.replace(/^\r?\n/, "").replace(/\r?\n$/, ""), found);
    }
  } else if (disposition !== "attachment") {
    // Line breaks are CRLF on the wire; callers compare with what the app passed in (LF).
    const decoded = decodeBody(
      body,
      headers["content-transfer-encoding"] ?? "7bit",
      type.params.charset ?? "utf-8",
    ).replace(/\r\n/g, "\n");
    if (type.value === "text/plain" && found.text === null) found.text = decoded;
    if (type.value === "text/html" && found.html === null) found.html = decoded;
  }
  return headers;
}

export function parseMail(raw: string): ParsedMail {
  const found = { text: null as string | null, html: null as string | null };
  // The CRLF before the final "." belongs to the SMTP terminator, not to the message text.
  const headers = walk(raw.replace(/\r?\n$/, ""), found);
  return { headers, ...found };
}
