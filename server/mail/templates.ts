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
