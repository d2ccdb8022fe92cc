/** Just enough RFC 5322 parsing to show the development mailbox: a few headers and the text body. */
export type KeptMessage = { id: number; to: string; subject: string; text: string; receivedAt: string };

function decodeQuotedPrintable(text: string): string {
  const bytes = text
    .replace(/=\r?\n/g, '')
    .replace(/=([0-9A-F]{2})/gi, (_m, h: string) => String.fromCharCode(parseInt(h, 16)));
  return Buffer.from(bytes, 'latin1').toString('utf8');
}

function decodeHeader(value: string): string {
  return value.replace(/=\?utf-8\?([QB])\?([^?]*)\?=/gi, (_m, enc: string, data: string) =>
    enc.toUpperCase() === 'B'
      ? Buffer.from(data, 'base64').toString('utf8')
      : decodeQuotedPrintable(data.replace(/_/g, ' ')),
  );
}

export function simpleParse(raw: string, id: number): KeptMessage {
  const split = raw.search(/\r?\n\r?\n/);
  const head = raw.slice(0, split).replace(/\r?\n[ \t]+/g, ' ');
  const body = raw.slice(split).replace(/^\r?\n\r?\n/, '');
  const header = (name: string) => decodeHeader(new RegExp(`^${name}:\\s*(.*)$`, 'im').exec(head)?.[1]?.trim() ?? '');
  const encoding = header('Content-Transfer-Encoding').toLowerCase();
  const text =
    encoding === 'quoted-printable'
      ? decodeQuotedPrintable(body)
      : encoding === 'base64'
        ? Buffer.from(body, 'base64').toString('utf8')
        : body;
  return { id, to: header('To'), subject: header('Subject'), text: text.trim(), receivedAt: new Date().toISOString() };
}
