'use client';

export { RootSegmentError as default } from '@/components/layout/segment-error';
