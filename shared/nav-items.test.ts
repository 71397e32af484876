import { describe, expect, it } from 'vitest';
import { ROLES } from '@/shared/roles';
import { activeItem, homeFor, navItemsFor, NAV_ITEMS } from './nav-items';

describe('navigation entries by role', () => {
  it('shows each role only what the design allows', () => {
    const labels = (role: (typeof ROLES)[number]) => navItemsFor(role).map((i) => i.label);
    expect(labels('owner')).toEqual(['Jobs', 'Support', 'Trees', 'Readings', 'Patterns', 'Settings']);
    expect(labels('lead')).toEqual(['Jobs', 'Support', 'Trees', 'Readings', 'Patterns']);
    expect(labels('tech')).toEqual(['Jobs', 'Trees', 'Readings']);
    expect(labels('support')).toEqual(['Support', 'Trees', 'Readings']);
  });

  it('lands every role on the first entry it may use', () => {
    expect(homeFor('owner')).toBe('/jobs');
    expect(homeFor('tech')).toBe('/jobs');
    expect(homeFor('support')).toBe('/support');
  });

  it('marks the entry a nested path belongs to', () => {
    expect(activeItem('/settings/people', NAV_ITEMS)?.key).toBe('settings');
    expect(activeItem('/jobs', NAV_ITEMS)?.key).toBe('jobs');
    expect(activeItem('/jobsite', NAV_ITEMS)).toBeUndefined();
  });
});
