import type { Job } from '@/shared/schemas/jobs';

/** "2005 Buick Century 3.1 V6", or a placeholder when nothing about the vehicle is recorded. */
export function vehicleLine(job: Pick<Job, 'year' | 'make' | 'model' | 'engine'>): string {
  return [job.year, job.make, job.model, job.engine].filter(Boolean).join(' ') || 'Vehicle not recorded';
}

/** "3 Dec 2026" in the reader's locale. */
export function shortDate(iso: string): string {
  return new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}
