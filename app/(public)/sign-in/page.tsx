import type { Metadata } from 'next';
import { SignInForm } from '@/components/auth/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default function SignInPage() {
  return (
    <>
      <h2 className="mb-5 text-xl font-bold">Sign in</h2>
      <SignInForm />
    </>
  );
}
