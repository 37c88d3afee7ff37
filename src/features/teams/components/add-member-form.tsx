import { useState } from 'react';
import { roleLabels, type Role } from '@shared/permissions';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useAddMember } from '../api/add-member';

export type Candidate = { id: string; name: string; email: string; role: Role };

export type AddMemberFormProps = {
  teamId: string;
  teamName: string;
  /** Active accounts that are not members yet. */
  candidates: Candidate[];
  onAdded?: (candidate: Candidate) => void;
};

export function AddMemberForm({ teamId, teamName, candidates, onAdded }: AddMemberFormProps) {
  const [userId, setUserId] = useState('');
  const add = useAddMember();
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    const candidate = candidates.find((c) => c.id === userId);
    if (!candidate) return;
    add.mutate(
      { teamId, userId },
      {
        onSuccess: () => {
          setUserId('');
          onAdded?.(candidate);
        },
      },
    );
  };
  if (candidates.length === 0) {
    return <p className="text-ink-muted">Everyone with an active account is already in {teamName}.</p>;
  }
  return (
    <form onSubmit={submit} className="flex items-end gap-2">
      <SelectField
        label="Add a member"
        value={userId}
        onChange={(e) => setUserId(e.target.value)}
        className="w-96"
      >
        <option value="">Choose a person…</option>
        {candidates.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name} · {roleLabels[c.role]} · {c.email}
          </option>
        ))}
      </SelectField>
      <Button type="submit" variant="primary" disabled={!userId} busy={add.isPending}>
        Add
      </Button>
      {add.error && <Notice tone="error">{add.error.message}</Notice>}
    </form>
  );
}
