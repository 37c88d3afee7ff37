// A comment on the study (writers only; viewers read them in the history).
import { useState, type FormEvent } from 'react';
import { commentSchema } from '@shared/schemas/review';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { useAddComment } from '../api/add-comment';

export type CommentFormProps = { studyId: string };

export function CommentForm({ studyId }: CommentFormProps) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | null>(null);
  const add = useAddComment(studyId, { onSuccess: () => setBody('') });
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const checked = commentSchema.safeParse({ body });
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? 'Write a comment first.');
    setError(null);
    add.mutate(checked.data.body);
  };
  return (
    <form onSubmit={submit} noValidate className="max-w-3xl space-y-2">
      <TextAreaField
        label="Add a comment"
        rows={3}
        value={body}
        error={error ?? add.error?.message}
        onChange={(e) => setBody(e.target.value)}
        hint="Comments stay with the study and show in its history."
      />
      <Button type="submit" busy={add.isPending}>
        Add comment
      </Button>
    </form>
  );
}
