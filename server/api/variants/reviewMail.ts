/** Wording of the review notice e-mail. */

/** Subject and text of "variant X is now <status>". */
export function reviewMail(p: { actor: string; variant: string; status: string; link: string; message?: string }): { subject: string; text: string } {
  const subject = p.status === 'in review' ? `Review requested: ${p.variant}` : `Review decided: ${p.variant} — ${p.status}`;
  const text = [
    `${p.actor} set the variant "${p.variant}" to ${p.status}.`,
    ...(p.message ? ['', `Note: ${p.message}`] : []),
    '',
    `Open it in Heatloom: ${p.link}`,
  ].join('\n');
  return { subject, text };
}
