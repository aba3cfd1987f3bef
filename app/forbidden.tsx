import { StatusPage } from '@/components/layout/status-page';

export default function Forbidden() {
  return (
    <StatusPage
      code={403}
      title="Your role does not open this page"
      body="Ask an admin of your organisation if you need it."
    />
  );
}
