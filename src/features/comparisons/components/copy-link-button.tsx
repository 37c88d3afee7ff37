// Copies the comparison's address: anyone in the team opens it with that link (others get "not found").
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';

export type CopyLinkButtonProps = { href: string };

export function CopyLinkButton({ href }: CopyLinkButtonProps) {
  const toast = useToast();
  const [shown, setShown] = useState(false);
  const url = `${window.location.origin}${href}`;
  const copy = () => {
    if (!navigator.clipboard) {
      setShown(true);
      return;
    }
    navigator.clipboard.writeText(url).then(
      () => toast.show('Link copied. Anyone in the team can open it.'),
      () => setShown(true),
    );
  };
  return (
    <span className="inline-flex items-center gap-2">
      <Button size="sm" onClick={copy}>
        Copy link
      </Button>
      {shown && (
        <input
          readOnly
          aria-label="Link to this comparison"
          value={url}
          onFocus={(e) => e.target.select()}
          autoFocus
          className="h-7 w-80 rounded border border-line-strong bg-surface px-2 text-sm"
        />
      )}
    </span>
  );
}
