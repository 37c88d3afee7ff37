import { createColumnHelper } from '@tanstack/react-table';
import type { MailSummary } from '@shared/schemas/api-types';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/lib/format';

const column = createColumnHelper<MailSummary>();

const columns = [
  column.accessor('receivedAt', {
    header: 'Received',
    meta: { className: 'w-36 whitespace-nowrap tabular-nums' },
    cell: (c) => formatDateTime(c.getValue()),
  }),
  column.accessor('subject', {
    header: 'Subject',
    cell: (c) => <span className="font-semibold">{c.getValue() || '(no subject)'}</span>,
  }),
  column.accessor((m) => m.recipients.join(', '), {
    id: 'recipients',
    header: 'To',
    meta: { className: '[overflow-wrap:anywhere]' },
  }),
];

export type MessageListProps = {
  messages: MailSummary[];
  selectedId?: string;
  onOpen: (message: MailSummary) => void;
};

/** The outbox, newest first, as the server sends it; a row opens the message. */
export function MessageList({ messages, selectedId, onOpen }: MessageListProps) {
  return (
    <DataTable
      data={messages}
      columns={columns}
      label="Messages"
      enableSorting={false}
      search={{ label: 'Search this page', placeholder: 'Subject or recipient' }}
      getRowId={(m) => m.id}
      selectedRowId={selectedId ?? null}
      onRowClick={onOpen}
      empty="No messages yet. Invitations and password resets appear here when they are sent."
    />
  );
}
