// Plain text with its web addresses made clickable. The text is never parsed as HTML: each part
// becomes a text node or a link, so nothing in a message can inject markup or script.
import { Fragment } from 'react';
import { Link } from 'react-router';

const urlPattern = /https?:\/\/[^\s<>"'()]+/g;
const trailing = /[.,;:!?\]]+$/;

type Part = { text: string; href?: string };

export function splitLinks(text: string): Part[] {
  const parts: Part[] = [];
  let last = 0;
  for (const match of text.matchAll(urlPattern)) {
    const url = match[0].replace(trailing, '');
    const start = match.index;
    if (start > last) parts.push({ text: text.slice(last, start) });
    parts.push({ text: url, href: url });
    last = start + url.length;
  }
  if (last < text.length) parts.push({ text: text.slice(last) });
  return parts;
}

/** Same-site links stay in the app; others open in a new tab without access back to this one. */
function SmartLink({ href }: { href: string }) {
  const cls = 'break-all text-accent-700 underline';
  let url: URL;
  try {
    url = new URL(href);
  } catch {
    return <>{href}</>;
  }
  if (url.origin === window.location.origin) {
    return (
      <Link to={url.pathname + url.search + url.hash} className={cls}>
        {href}
      </Link>
    );
  }
  return (
    <a href={href} target="_blank" rel="noopener noreferrer" className={cls}>
      {href}
    </a>
  );
}

export type LinkifiedTextProps = { text: string };

export function LinkifiedText({ text }: LinkifiedTextProps) {
  return (
    <>
      {splitLinks(text).map((part, i) => (
        <Fragment key={i}>{part.href ? <SmartLink href={part.href} /> : part.text}</Fragment>
      ))}
    </>
  );
}
