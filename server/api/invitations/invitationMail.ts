/** Wording of the invitation e-mail (plain text and simple HTML). */
import type { Role } from '@shared/schemas/roles';

const escape = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Subject, text and HTML of an invitation to `workspace` as `role`. */
export function invitationMail(p: { inviter: string; workspace: string; role: Role; link: string; expiresAt: Date }): {
  subject: string; text: string; html: string;
} {
  const until = p.expiresAt.toISOString().slice(0, 10);
  const subject = `${p.inviter} invited you to ${p.workspace} on Heatloom`;
  const text = [
    `${p.inviter} invited you to join the workspace "${p.workspace}" on Heatloom as ${p.role}.`,
    '',
    `Open this link to set your password and join: ${p.link}`,
    '',
    `The link works once and expires on ${until}. If you did not expect this invitation, ignore this message.`,
  ].join('\n');
  const html =
    `<p>${escape(p.inviter)} invited you to join the workspace <strong>${escape(p.workspace)}</strong> on Heatloom as ${p.role}.</p>` +
    `<p><a href="${escape(p.link)}">Accept the invitation</a></p>` +
    `<p>The link works once and expires on ${until}. If you did not expect this invitation, ignore this message.</p>`;
  return { subject, text, html };
}
