import type { Role } from '../repositories/user-repository';

/** The invented demo shop and its people (one per role). Printed by `npm start`. */
export const DEMO_SHOP = {
  name: 'Kestrel Ridge Performance',
  altitude_m: 1100,
  pressure_unit: 'inHg',
  comeback_window_days: 30,
  contact_phone: '555-0142',
  contact_email: 'service@kestrel-ridge.example',
};

export const DEMO_PASSWORD = 'baywalk-demo-2026';

export const DEMO_PEOPLE: Array<{ name: string; email: string; role: Role }> = [
  { name: 'Dana Okafor', email: 'dana@kestrel-ridge.example', role: 'owner' },
  { name: 'Marcus Lindqvist', email: 'marcus@kestrel-ridge.example', role: 'lead' },
  { name: 'Priya Raman', email: 'priya@kestrel-ridge.example', role: 'tech' },
  { name: 'Sam Ortega', email: 'sam@kestrel-ridge.example', role: 'support' },
];
