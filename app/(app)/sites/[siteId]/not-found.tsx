// The register's segments miss the way every signed-in page does.
export { default } from '@/app/(app)/not-found';
