// The text of the messages Bellwether sends. Plain text first; a simple HTML part with the link.
import type { Mail } from './mailer';

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function withLink(lines: string[], link: string, linkText: string): Pick<Mail, 'text' | 'html'> {
  const text = [...lines, '', `${linkText}: ${link}`, '', '— Bellwether'].join('\n');
  const html = [
    ...lines.map((l) => `<p>${escape(l)}</p>`),
    `<p><a href="${escape(link)}">${escape(linkText)}</a></p>`,
    '<p>— Bellwether</p>',
  ].join('\n');
  return { text, html };
}

export function invitationMail(input: { to: string; inviter: string; roleLabel: string; teamName: string | null; link: string }): Mail {
  const team = input.teamName ? ` in the team "${input.teamName}"` : '';
  return {
    to: input.to,
    subject: 'You are invited to Bellwether',
    ...withLink(
      [
        `${input.inviter} invited you to Bellwether as ${input.roleLabel}${team}.`,
        'Open the link to choose your name and password. It works once and expires in 72 hours.',
      ],
      input.link,
      'Accept the invitation',
    ),
  };
}

export function passwordResetMail(input: { to: string; link: string }): Mail {
  return {
    to: input.to,
    subject: 'Reset your Bellwether password',
    ...withLink(
      [
        'Someone asked to reset the password of this Bellwether account.',
        'Open the link within one hour to choose a new password. If it was not you, ignore this message.',
      ],
      input.link,
      'Choose a new password',
    ),
  };
}

export function reviewRequestMail(input: { to: string[]; author: string; study: string; message: string; link: string }): Mail {
  return {
    to: input.to,
    subject: `Review requested: ${input.study}`,
    ...withLink(
      [
        `${input.author} submitted the study "${input.study}" for your review.`,
        ...(input.message ? [`Their note: ${input.message}`] : []),
        'Open the study to check its fits, QC and exclusions, then approve it or return it with comments.',
      ],
      input.link,
      'Open the study',
    ),
  };
}

export function reviewDecisionMail(input: {
  to: string;
  reviewer: string;
  study: string;
  decision: 'approved' | 'returned' | 'unlocked';
  comment: string;
  link: string;
}): Mail {
  const verb = { approved: 'approved and locked', returned: 'returned', unlocked: 'unlocked' }[input.decision];
  return {
    to: input.to,
    subject: `Study ${input.decision}: ${input.study}`,
    ...withLink(
      [
        `${input.reviewer} ${verb} the study "${input.study}".`,
        ...(input.comment ? [`Comment: ${input.comment}`] : []),
        ...(input.decision === 'approved' ? [] : ['You can edit it again and resubmit it when ready.']),
      ],
      input.link,
      'Open the study',
    ),
  };
}
