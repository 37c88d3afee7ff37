import { PageHeader } from '@/components/ui/page-header';
import { AccountDetails } from '@/features/account/components/account-details';
import { ChangePasswordForm } from '@/features/account/components/change-password-form';
import { useUser } from '@/lib/auth';

export default function AccountRoute() {
  const { data: me } = useUser();
  if (!me) return null;
  return (
    <>
      <PageHeader
        title="Account"
        description="Your name, e-mail and role are set when you join; an admin changes the role and the teams."
      />
      <div className="grid grid-cols-2 items-start gap-6">
        <section className="rounded-md border border-line bg-surface p-5" aria-labelledby="account-details">
          <h2 id="account-details" className="mb-3 text-lg">
            Your details
          </h2>
          <AccountDetails me={me} />
        </section>
        <section className="rounded-md border border-line bg-surface p-5" aria-labelledby="account-password">
          <h2 id="account-password" className="mb-3 text-lg">
            Change password
          </h2>
          <ChangePasswordForm email={me.email} />
        </section>
      </div>
    </>
  );
}
