// The mail catcher's HTTP API (maildev, started by scripts/stack.mjs), for tests that check what was sent.
type Mail = { subject: string; text: string; to: { address: string }[]; time: string };

const api = () => process.env.MAILDEV_API || "http://127.0.0.1:1090";

export async function mailsTo(address: string): Promise<Mail[]> {
  const mails = (await (await fetch(`${api()}/api/email`)).json()) as Mail[];
  return mails.filter((m) => m.to.some((t) => t.address === address));
}

/** Waits (up to 10 s) for a mail to `address` whose subject matches; mail goes out after the answer. */
export async function waitForMail(address: string, subject: RegExp): Promise<Mail> {
  for (let i = 0; i < 40; i++) {
    const match = (await mailsTo(address)).find((m) => subject.test(m.subject));
    if (match) return match;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no mail to ${address} matching ${subject}`);
}
