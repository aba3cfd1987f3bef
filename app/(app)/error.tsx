'use client';

export { SegmentError as default } from '@/components/layout/segment-error';
