import type { Metadata } from 'next';
import { SignInForm } from '@/components/auth/sign-in-form';
import { safeReturnPath } from '@/lib/http/return-path';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { next } = await searchParams;
  return (
    <>
      <h2 className="mb-5 text-xl font-bold">Sign in</h2>
      <SignInForm next={safeReturnPath(next)} />
    </>
  );
}
