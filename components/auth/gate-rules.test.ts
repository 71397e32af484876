import { describe, expect, it } from 'vitest';
import type { Me } from '@/shared/schemas/auth';
import { gateRedirect, safeNext } from './gate-rules';

const tech: Me = { id: 1, name: 'T', email: 't@x.example', role: 'tech', shop: { id: 1, name: 'S' } };

describe('sign-in gate', () => {
  it('sends anonymous people from signed-in screens to sign-in, remembering the page', () => {
    expect(gateRedirect({ user: null, segments: ['(app)', 'jobs', '[id]'], pathname: '/jobs/4' })).toEqual({ pathname: '/sign-in', params: { next: '/jobs/4' } });
    expect(gateRedirect({ user: null, segments: ['(app)'], pathname: '/' })).toEqual({ pathname: '/sign-in' });
  });

  it('remembers the address first opened when the router fell back to `/` while loading', () => {
    expect(gateRedirect({ user: null, segments: ['(app)'], pathname: '/', deepLink: '/settings/people' })).toEqual({ pathname: '/sign-in', params: { next: '/settings/people' } });
    expect(gateRedirect({ user: null, segments: ['(app)'], pathname: '/', deepLink: 'https://evil.example' })).toEqual({ pathname: '/sign-in' });
  });

  it('never redirects while the session is still loading', () => {
    expect(gateRedirect({ user: undefined, segments: ['(app)', 'jobs'], pathname: '/jobs' })).toBeUndefined();
    expect(gateRedirect({ user: undefined, segments: ['(auth)', 'sign-in'], pathname: '/sign-in' })).toBeUndefined();
  });

  it('sends signed-in people away from sign-in, to `next` when it is safe', () => {
    expect(gateRedirect({ user: tech, segments: ['(auth)', 'sign-in'], pathname: '/sign-in' })).toEqual({ pathname: '/' });
    expect(gateRedirect({ user: tech, segments: ['(auth)', 'sign-in'], pathname: '/sign-in', next: '/jobs/4' })).toEqual({ pathname: '/jobs/4' });
    expect(gateRedirect({ user: tech, segments: ['(auth)', 'sign-up'], pathname: '/sign-up', next: '//evil.example' })).toEqual({ pathname: '/' });
  });

  it('lets anyone open a reset or invitation link, and public pages', () => {
    expect(gateRedirect({ user: tech, segments: ['(auth)', 'accept-invite'], pathname: '/accept-invite' })).toBeUndefined();
    expect(gateRedirect({ user: null, segments: ['(auth)', 'reset-password'], pathname: '/reset-password' })).toBeUndefined();
    expect(gateRedirect({ user: null, segments: ['g', '[token]'], pathname: '/g/abc' })).toBeUndefined();
    expect(gateRedirect({ user: tech, segments: ['g', '[token]'], pathname: '/g/abc' })).toBeUndefined();
    // A guest link's token never travels on as a `next` address.
    expect(safeNext('/g/abc')).toBeUndefined();
  });

  it('follows only same-site `next` paths', () => {
    expect(safeNext('/trees/3')).toBe('/trees/3');
    expect(safeNext('https://evil.example')).toBeUndefined();
    expect(safeNext('/\\evil.example')).toBeUndefined();
    expect(safeNext('/sign-in')).toBeUndefined();
    expect(safeNext(['/jobs'])).toBeUndefined();
  });
});
