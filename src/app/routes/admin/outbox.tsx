// The outbox of the local mail server (development, demo and tests): messages newest first; a row
// opens the message beside the list, at its own address.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { useNavigate, useParams, useSearchParams } from 'react-router';
import { Notice, QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Pager } from '@/components/ui/pager';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getMessageQueryOptions, useMessage } from '@/features/outbox/api/get-message';
import { getMessagesQueryOptions, useMessages } from '@/features/outbox/api/get-messages';
import { MessageList } from '@/features/outbox/components/message-list';
import { MessageView } from '@/features/outbox/components/message-view';
import { warmCacheFor } from '@/lib/auth';

const limit = 50;
const offsetFrom = (search: URLSearchParams) =>
  Math.max(0, Number.parseInt(search.get('offset') ?? '0', 10) || 0);

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) =>
    warmCacheFor(
      queryClient,
      'outbox:read',
      () =>
        queryClient.ensureQueryData(
          getMessagesQueryOptions({ limit, offset: offsetFrom(new URL(request.url).searchParams) }),
        ),
      () =>
        params.messageId
          ? queryClient.ensureQueryData(getMessageQueryOptions(params.messageId))
          : Promise.resolve(),
    );

export default function OutboxRoute() {
  const { messageId } = useParams();
  const [search, setSearch] = useSearchParams();
  const navigate = useNavigate();
  const offset = offsetFrom(search);
  const messages = useMessages({ limit, offset });
  const header = (
    <PageHeader
      title="Outbox"
      description="E-mail that Bellwether sent to the local mail server (no message leaves this machine). Newest first."
    />
  );
  if (messages.isPending)
    return (
      <>
        {header}
        <Loading label="Loading messages…" />
      </>
    );
  if (messages.isError)
    return (
      <>
        {header}
        <QueryError error={messages.error} what="the outbox" onRetry={() => void messages.refetch()} />
      </>
    );

  const keep = offset ? `?offset=${offset}` : '';
  return (
    <>
      {header}
      <div className="grid grid-cols-[minmax(0,5fr)_minmax(0,6fr)] items-start gap-6">
        <div>
          <MessageList
            messages={messages.data.items}
            selectedId={messageId}
            onOpen={(m) => void navigate(paths.outboxMessage.href(m.id) + keep)}
          />
          <Pager
            offset={offset}
            limit={limit}
            total={messages.data.total}
            noun="messages"
            onChange={(o) => setSearch(o ? { offset: String(o) } : {})}
          />
        </div>
        <SelectedMessage id={messageId} />
      </div>
    </>
  );
}

function SelectedMessage({ id }: { id?: string }) {
  const message = useMessage(id);
  if (!id) return <Notice>Choose a message to read it.</Notice>;
  if (message.isPending) return <Loading label="Opening the message…" />;
  if (message.isError)
    return <QueryError error={message.error} what="this message" onRetry={() => void message.refetch()} />;
  return <MessageView message={message.data} />;
}
