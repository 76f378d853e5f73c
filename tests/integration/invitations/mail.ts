// Reading e-mail back from the test mail catcher, filtered by recipient.
export type CaughtMail = { id: number; to: string[]; subject: string; text: string; html: string };

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const res = await fetch(`${process.env.MAIL_URL}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as CaughtMail[];
}

/** Waits until at least `n` e-mails (mentioning `containing`, when given) have reached `address`; returns them. */
export async function waitForMail(address: string, n = 1, timeoutMs = 20_000, containing?: string): Promise<CaughtMail[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const list = (await mailTo(address)).filter((m) => !containing || m.text.includes(containing));
    if (list.length >= n) return list;
    if (Date.now() > deadline) throw new Error(`expected ${n} e-mail(s) to ${address}, got ${list.length}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export function inviteTokenIn(mail: CaughtMail): string {
  const match = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match) throw new Error(`no invitation link in: ${mail.text}`);
  return match[1]!;
}
