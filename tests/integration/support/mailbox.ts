import type { CaughtMail } from '../../../shared/schemas/mailbox';

/** Messages the SMTP fake caught for one address, newest first. */
export async function mailFor(address: string): Promise<CaughtMail[]> {
  const res = await fetch(`${process.env.MAIL_FAKE_URL}/messages`);
  const { messages } = (await res.json()) as { messages: CaughtMail[] };
  return messages.filter((m) => m.to.includes(address));
}

/** The last path segment of the newest link sent to the address whose path contains `kind`. */
export async function tokenFromMail(address: string, kind: 'invitations' | 'reset-password'): Promise<string> {
  for (let i = 0; i < 50; i++) {
    const link = (await mailFor(address)).flatMap((m) => m.links).find((l) => l.includes(`/${kind}/`));
    if (link) return link.split('/').pop()!;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no ${kind} mail for ${address}`);
}
