// The root layout: header (mark, the signed-in person, Sign out), the navigation for their role,
// and the page. Signed-out pages (sign-in, invitations, resets) get the header without a menu.
import { Outlet } from 'react-router';
import { roleLabels } from '@shared/permissions';
import { Button } from '@/components/ui/button';
import { useSignOut, useUser } from '@/lib/auth';
import { Brand } from './brand';
import { MainNav } from './main-nav';

export function AppLayout() {
  const { data: me } = useUser();
  const signOut = useSignOut();
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-line bg-surface">
        <div className="mx-auto flex h-14 max-w-page items-center justify-between px-6">
          <Brand />
          {me && (
            <div className="flex items-center gap-4">
              <p className="text-right leading-tight">
                <span className="block font-semibold">{me.name}</span>
                <span className="block text-sm text-ink-muted">{roleLabels[me.role]}</span>
              </p>
              <Button size="sm" busy={signOut.isPending} onClick={() => signOut.mutate()}>
                Sign out
              </Button>
            </div>
          )}
        </div>
      </header>
      {me && <MainNav role={me.role} />}
      <main className="mx-auto w-full max-w-page flex-1 px-6 py-6">
        <Outlet />
      </main>
    </div>
  );
}
