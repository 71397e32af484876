import { describe, expect, it } from 'vitest';
import { jobInputSchema } from '@/shared/schemas/jobs';
import { jobFormValues, toJobInput } from './job-form-values';

describe('job form values', () => {
  it('reads numbers with thousands separators and leaves blanks as null', () => {
    const input = toJobInput({ ...jobFormValues(), roNumber: 'R1', customerName: 'A', mileage: '142,300', year: ' ' });
    expect(input.mileage).toBe(142300);
    expect(input.year).toBeNull();
  });

  it('turns text that is not a whole number into a schema message', () => {
    const parsed = jobInputSchema.safeParse(toJobInput({ ...jobFormValues(), roNumber: 'R1', customerName: 'A', mileage: '12k' }));
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0].message).toMatch(/mileage as a number/);
  });

  it('drops the VIN override once the VIN passes its check digit (49 CFR 565.15 example 1G4AH59H45G118341)', () => {
    expect(toJobInput({ ...jobFormValues(), vin: '1g4ah59h45g118341', vinOverride: true }).vinOverride).toBe(false);
    expect(toJobInput({ ...jobFormValues(), vin: '1M8GDM9A0KP042788', vinOverride: true }).vinOverride).toBe(true);
  });
});
