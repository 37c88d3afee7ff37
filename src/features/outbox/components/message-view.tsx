// One message: its header, the text with clickable links, and on request the HTML part shown in
// a sandboxed frame (no scripts, no same-origin access, nothing loaded from outside).
import { useState } from 'react';
import type { MailMessage } from '@shared/schemas/api-types';
import { Button } from '@/components/ui/button';
import { formatDateTimeSeconds } from '@/lib/format';
import { LinkifiedText } from './linkified-text';

export type MessageViewProps = { message: MailMessage };

export function MessageView({ message }: MessageViewProps) {
  const [showHtml, setShowHtml] = useState(false);
  return (
    <article aria-labelledby="message-subject" className="rounded-md border border-line bg-surface">
      <header className="border-b border-line px-5 py-3">
        <h2 id="message-subject" className="text-lg">
          {message.subject || '(no subject)'}
        </h2>
        <dl className="mt-1 grid grid-cols-[4rem_1fr] gap-x-3 text-sm">
          <dt className="text-ink-muted">From</dt>
          <dd>{message.sender}</dd>
          <dt className="text-ink-muted">To</dt>
          <dd>{message.recipients.join(', ')}</dd>
          <dt className="text-ink-muted">Received</dt>
          <dd className="tabular-nums">{formatDateTimeSeconds(message.receivedAt)}</dd>
        </dl>
      </header>
      <div className="px-5 py-4">
        <p className="font-sans leading-relaxed whitespace-pre-wrap">
          <LinkifiedText text={message.text || '(This message has no plain-text part.)'} />
        </p>
        {message.html && (
          <div className="no-print mt-4 border-t border-line pt-3">
            <Button size="sm" variant="ghost" onClick={() => setShowHtml((v) => !v)} aria-expanded={showHtml}>
              {showHtml ? 'Hide the HTML part' : 'Show the HTML part'}
            </Button>
            {showHtml && (
              <iframe
                title="HTML part of the message"
                sandbox=""
                srcDoc={message.html}
                className="mt-2 h-64 w-full rounded border border-line bg-white"
              />
            )}
          </div>
        )}
      </div>
    </article>
  );
}
