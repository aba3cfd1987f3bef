import { LoadingState } from '@/components/layout/page-states';

export default function Loading() {
  return <LoadingState />;
}
