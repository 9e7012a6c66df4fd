/** Mail wording: the invitation link and the escaping of user-given names in HTML; review notices. */
import { describe, expect, it } from 'vitest';
import { invitationMail } from '../../../server/api/invitations/invitationMail';
import { reviewMail } from '../../../server/api/variants/reviewMail';

describe('invitationMail', () => {
  it('puts the link in text and HTML and escapes names', () => {
    const m = invitationMail({ inviter: 'Ada <script>', workspace: 'R&D "Team"', role: 'engineer', link: 'http://h.example/invite/abc', expiresAt: new Date('2031-05-04T10:00:00Z') });
    expect(m.text).toContain('http://h.example/invite/abc');
    expect(m.text).toContain('2031-05-04');
    expect(m.html).toContain('href="http://h.example/invite/abc"');
    expect(m.html).toContain('Ada &lt;script&gt;');
    expect(m.html).toContain('R&amp;D &quot;Team&quot;');
    expect(m.html).not.toContain('<script>');
  });
});

describe('reviewMail', () => {
  it('says who moved which variant where, with the note', () => {
    const req = reviewMail({ actor: 'Emil', variant: 'B', status: 'in review', link: 'http://h.example/variants/3', message: 'tiers near limit' });
    expect(req.subject).toBe('Review requested: B');
    expect(req.text).toContain('Note: tiers near limit');
    expect(reviewMail({ actor: 'Rosa', variant: 'B', status: 'approved', link: 'x' }).subject).toBe('Review decided: B — approved');
  });
});
