import Link from 'next/link';

export default function AppNotFound() {
  return (
    <div className="flex flex-col items-start gap-3 rounded-card bg-paper-raised p-6 shadow-card">
      <h1 className="text-xl font-bold">Not found</h1>
      <p className="text-sm text-ink-soft">Nothing with that address exists in your organisation.</p>
      <Link href="/" className="text-sm font-semibold text-cord-600 underline">
        Back to the overview
      </Link>
    </div>
  );
}
