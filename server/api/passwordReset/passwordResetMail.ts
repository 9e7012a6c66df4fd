/** Wording of the password-reset e-mail (plain text and simple HTML). */

const escape = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Subject, text and HTML of a reset link for the account `email`, valid until `expiresAt`. */
export function passwordResetMail(p: { email: string; link: string; expiresAt: Date }): { subject: string; text: string; html: string } {
  const until = `${p.expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
  const subject = 'Choose a new Heatloom password';
  const text = [
    `Someone asked to set a new password for the Heatloom account ${p.email}.`,
    '',
    `Open this link to choose a new password: ${p.link}`,
    '',
    `The link works once and expires at ${until}. If you did not ask for this, ignore this message: your password stays as it is.`,
  ].join('\n');
  const html =
    `<p>Someone asked to set a new password for the Heatloom account <strong>${escape(p.email)}</strong>.</p>` +
    `<p><a href="${escape(p.link)}">Choose a new password</a></p>` +
    `<p>The link works once and expires at ${until}. If you did not ask for this, ignore this message: your password stays as it is.</p>`;
  return { subject, text, html };
}
