// Just enough RFC 5322 / MIME reading for the development receiver: nodemailer sends our plain-text mail
// as one part in 7bit, quoted-printable or base64. Headers are unfolded; encoded-word subjects are decoded.

export interface ParsedMail {
  subject: string;
  from: string;
  to: string;
  body: string;
}

function decodeQuotedPrintable(s: string): string {
  const bytes: number[] = [];
  const soft = s.replace(/=\r?\n/g, "");
  for (let i = 0; i < soft.length; i++) {
    const c = soft[i];
    if (c === "=" && /^[0-9A-Fa-f]{2}$/.test(soft.slice(i + 1, i + 3))) {
      bytes.push(parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(c, "utf8"));
    }
  }
  return Buffer.from(bytes).toString("utf8");
}

function decodeWords(v: string): string {
  // RFC 2047 section 6.2: white space between adjacent encoded-words is not part of the text.
  return v.replace(/(\?=)\s+(?==\?)/g, "$1").replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_m, _cs, enc: string, data: string) =>
    enc.toUpperCase() === "B" ? Buffer.from(data, "base64").toString("utf8") : decodeQuotedPrintable(data.replace(/_/g, " ")),
  );
}

export function parseMail(raw: string): ParsedMail {
  const split = raw.search(/\r?\n\r?\n/);
  const head = split < 0 ? raw : raw.slice(0, split);
  let body = split < 0 ? "" : raw.slice(split).replace(/^\r?\n\r?\n/, "");
  const headers = new Map<string, string>();
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const i = line.indexOf(":");
    if (i > 0) headers.set(line.slice(0, i).trim().toLowerCase(), line.slice(i + 1).trim());
  }
  const enc = (headers.get("content-transfer-encoding") ?? "").toLowerCase();
  if (enc === "base64") body = Buffer.from(body.replace(/\s+/g, ""), "base64").toString("utf8");
  else if (enc === "quoted-printable") body = decodeQuotedPrintable(body);
  return {
    subject: decodeWords(headers.get("subject") ?? ""),
    from: decodeWords(headers.get("from") ?? ""),
    to: decodeWords(headers.get("to") ?? ""),
    body: body.replace(/\r\n/g, "\n").trimEnd(),
  };
}
