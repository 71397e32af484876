import { vinCheckDigit } from '@/shared/vin';
import type { InstallType } from '@/trees/tree-format';
import type { Random } from './demo-history-random';

/** Invented customer vehicles of the demo shop (real makes, made-up VINs and owners). */
export interface DemoVehicle {
  year: number;
  make: string;
  model: string;
  engine: string;
  /** First three VIN characters used for this kind of vehicle. */
  wmi: string;
}

export const DEMO_VEHICLES: readonly DemoVehicle[] = [
  { year: 2014, make: 'Chevrolet', model: 'Camaro SS', engine: '6.2 L V8', wmi: '2G1' },
  { year: 2016, make: 'Ford', model: 'Mustang GT', engine: '5.0 L V8', wmi: '1FA' },
  { year: 2012, make: 'Dodge', model: 'Challenger R/T', engine: '5.7 L V8', wmi: '2C3' },
  { year: 2008, make: 'Chevrolet', model: 'Silverado 1500', engine: '5.3 L V8', wmi: '1GC' },
  { year: 2019, make: 'Ford', model: 'F-150', engine: '5.0 L V8', wmi: '1FT' },
  { year: 2006, make: 'Pontiac', model: 'GTO', engine: '6.0 L V8', wmi: '6G2' },
  { year: 2015, make: 'Jeep', model: 'Wrangler', engine: '3.6 L V6', wmi: '1C4' },
  { year: 2003, make: 'Ford', model: 'Mustang Mach 1', engine: '4.6 L V8', wmi: '1FA' },
  { year: 2011, make: 'Chevrolet', model: 'Corvette', engine: '6.2 L V8', wmi: '1G1' },
  { year: 2017, make: 'Ram', model: '1500', engine: '5.7 L V8', wmi: '1C6' },
  { year: 1999, make: 'Chevrolet', model: 'Tahoe', engine: '5.7 L V8', wmi: '1GN' },
  { year: 2013, make: 'Ford', model: 'Mustang GT', engine: '5.0 L V8', wmi: '1ZV' },
];

const FIRST = ['Avery', 'Jordan', 'Casey', 'Riley', 'Morgan', 'Quinn', 'Rowan', 'Emerson', 'Harper', 'Reese', 'Dakota', 'Skyler', 'Jules', 'Marlowe', 'Tatum', 'Ellis', 'Noor', 'Imani', 'Kenji', 'Lucia'];
const LAST = ['Hollis', 'Brandt', 'Okonkwo', 'Castellan', 'Mirza', 'Fairweather', 'Lindgren', 'Abernathy', 'Solano', 'Whitcombe', 'Tran', 'Delacroix', 'Marsh', 'Ibarra', 'Kowalczyk', 'Sorensen'];

/** A customer name from the invented lists. */
export const customerName = (r: Random) => `${r.pick(FIRST)} ${r.pick(LAST)}`;

const YEAR_CODES = 'ABCDEFGHJKLMNPRSTVWXY123456789';
const VIN_ALPHABET = 'ABCDEFGHJKLMNPRSTUVWXYZ0123456789';
const LETTERS = 'ABCDEFGHJKLMNPRSTUVWXYZ';

/** A made-up VIN that passes the check digit and decodes to the vehicle's model year (49 CFR 565.15 layout). */
export function demoVin(v: DemoVehicle, r: Random, serial: number): string {
  const chars = (n: number) => Array.from({ length: n }, () => r.pick([...VIN_ALPHABET])).join('');
  // Position 7 is a letter for 2010 and later, a digit before (it picks the year cycle).
  const seventh = v.year >= 2010 ? r.pick([...LETTERS]) : String(r.int(1, 9));
  const yearCode = YEAR_CODES[(v.year - 1980) % 30];
  const body = `${v.wmi}${chars(3)}${seventh}${chars(1)}0${yearCode}${chars(1)}${String(100000 + (serial % 900000)).slice(-6)}`;
  return `${body.slice(0, 8)}${vinCheckDigit(body)}${body.slice(9)}`;
}

/** What an install of each type is written as on the job. */
export const INSTALL_TEXT: Record<InstallType, readonly string[]> = {
  intake_manifold: ['Two-piece intake manifold, new gaskets', 'Single-plane manifold swap', 'Ported intake manifold and new runner gaskets'],
  throttle_body: ['92 mm throttle body', 'Drive-by-wire throttle body, larger bore', 'Throttle body swap with new gasket'],
  throttle_body_adapter: ['Adapter plate for the larger throttle body', 'Throttle-body spacer and adapter'],
  camshaft: ['Stage 2 camshaft and springs', 'Mild camshaft, new lifters', 'Long-duration camshaft kit'],
  fuel_system_conversion: ['Returnless to return-style fuel conversion', 'In-tank pump upgrade and adjustable regulator'],
  sensor_relocation: ['MAP sensor moved to the new manifold', 'Intake air temperature sensor relocated'],
  other: ['Cold-air intake', 'Catch can plumbed into the PCV line'],
};

/** How often each install comes through the demo shop. */
export const INSTALL_WEIGHTS: ReadonlyArray<readonly [InstallType, number]> = [
  ['intake_manifold', 30],
  ['throttle_body', 18],
  ['throttle_body_adapter', 12],
  ['camshaft', 14],
  ['fuel_system_conversion', 10],
  ['sensor_relocation', 8],
  ['other', 3],
];

/** Which tree the car comes back for after each install (tree id in the stock library, weight). */
export const TREES_BY_INSTALL: Record<InstallType, ReadonlyArray<readonly [string, number]>> = {
  intake_manifold: [['lean-after-intake-manifold', 40], ['hiss-at-idle', 20], ['rough-idle-after-intake', 20], ['hard-pedal-after-install', 12]],
  throttle_body: [['high-idle-after-throttle-body', 50], ['throttle-fault-after-adapter', 25], ['hiss-at-idle', 15]],
  throttle_body_adapter: [['throttle-fault-after-adapter', 40], ['high-idle-after-throttle-body', 30], ['hiss-at-idle', 10], ['hard-pedal-after-install', 10]],
  camshaft: [['rough-idle-after-intake', 50], ['hard-pedal-after-install', 30]],
  fuel_system_conversion: [['fuel-conversion-hard-start', 100]],
  sensor_relocation: [['lean-after-intake-manifold', 50], ['hiss-at-idle', 30]],
  other: [['hiss-at-idle', 100]],
};

/**
 * The demo shop's planted patterns: causes found far more often after one
 * install (multiplies the final step's weight). `untilWeek` ends a pattern
 * early, as if the shop changed its install procedure then.
 */
export const PLANTED: ReadonlyArray<{ install: InstallType; step: string; weight: number; untilWeek?: number }> = [
  { install: 'intake_manifold', step: 'port-left-open', weight: 10, untilWeek: 19 },
  { install: 'intake_manifold', step: 'intake-gasket-leak', weight: 3 },
  { install: 'throttle_body_adapter', step: 'throttle-body-gasket-leak', weight: 10 },
  { install: 'throttle_body', step: 'throttle-relearn-not-done', weight: 6 },
  { install: 'fuel_system_conversion', step: 'returnless-rail-not-converted', weight: 8 },
  { install: 'sensor_relocation', step: 'map-sensor-seal-missing', weight: 8 },
  { install: 'camshaft', step: 'refer-calibration', weight: 5 },
];
