import type { Metadata } from 'next';
import { PasswordForm } from '@/components/profile/password-form';
import { ProfileForm } from '@/components/profile/profile-form';
import { signOutEverywhereAction } from '@/lib/actions/profile';
import { requireRole } from '@/lib/auth';

export const metadata: Metadata = { title: 'Profile' };

export default async function ProfilePage() {
  const me = await requireRole('any');
  return (
    <div className="flex flex-col gap-6">
      <header>
        <h1 className="text-2xl font-bold tracking-tight">Your profile</h1>
        <p className="text-sm text-ink-muted">
          Signed in as <span className="font-semibold">{me.email}</span>.
        </p>
      </header>
      {me.mustChangePassword ? (
        <p role="status" className="rounded-card border-l-4 border-brass-500 bg-brass-50 px-4 py-3 text-sm">
          You signed in with a one-time password. Choose your own password below before you go on: the one-time
          password will stop working.
        </p>
      ) : null}
      <div className="grid gap-6 md:grid-cols-2">
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <h2 className="mb-3 text-lg font-bold">Name and units</h2>
          <ProfileForm defaults={{ displayName: me.displayName, unitSystem: me.unitSystem }} />
        </section>
        <section className="rounded-card bg-paper-raised p-5 shadow-card">
          <h2 className="mb-3 text-lg font-bold">Password</h2>
          <PasswordForm />
        </section>
        <section className="rounded-card bg-paper-raised p-5 shadow-card md:col-span-2" aria-labelledby="devices-heading">
          <h2 id="devices-heading" className="mb-1 text-lg font-bold">Devices</h2>
          <p className="mb-3 text-sm text-ink-muted">
            Ends your session on every browser and device signed in to this account, this one included. Use it when a
            device is lost or shared; changing your password signs the other devices out as well.
          </p>
          <form action={signOutEverywhereAction}>
            <button
              type="submit"
              className="rounded-md border border-paper-rule px-3 py-1.5 text-sm font-semibold text-ink-soft hover:bg-paper-sunk"
            >
              Sign out on every device
            </button>
          </form>
        </section>
      </div>
    </div>
  );
}
