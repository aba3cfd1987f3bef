import { StatusPage } from '@/components/layout/status-page';

export default function NotFound() {
  return <StatusPage code={404} title="Nothing here" body="This page does not exist, or it belongs to another organisation." />;
}
