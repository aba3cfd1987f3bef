import type { Metadata } from 'next';
import { SignUpForm } from '@/components/auth/sign-up-form';

export const metadata: Metadata = { title: 'Set up your organisation' };

export default function SignUpPage() {
  return (
    <>
      <h2 className="mb-5 text-xl font-bold">Set up your organisation</h2>
      <SignUpForm />
    </>
  );
}
