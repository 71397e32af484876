/**
 * Likely causes and next checks for fuel-trim patterns. The pattern rules are
 * common practice, no published source (see REFERENCES for the project).
 */
import type { NextCheck } from './cautions';
import type { LikelyCause } from './vacuum-causes';
import type { TrimPattern, TrimScope } from './fuel-trim';

const RUN: NextCheck['cautions'] = ['running_engine'];
const reread: NextCheck = { text: 'After any repair, read the trims again at idle and at about 2 500 rpm, engine warm.', cautions: RUN };
const smokeTest: NextCheck = { text: 'Smoke-test the intake with the engine off: manifold and throttle-body gaskets, port plugs, sensor seals, PCV and brake booster hoses.', cautions: ['smoke_test'] };
const fuelPressure: NextCheck = { text: 'Measure fuel pressure key on engine off and at idle against the specification; if it holds, check volume.', cautions: ['fuel_pressure', 'running_engine'] };
const airFlow: NextCheck = { text: 'Compare the air-flow (or MAP) sensor reading at idle and 2 500 rpm with what the engine should show; look for a torn intake boot after the sensor.', cautions: RUN };
const exhaustLeak: NextCheck = { text: 'Look and listen for exhaust leaks at the manifold and joints ahead of the oxygen sensor, starting with the engine cold.', cautions: RUN };

const BY_PATTERN: Readonly<Record<TrimPattern, LikelyCause[]>> = {
  normal: [],
  not_enough_readings: [],
  unmetered_air: [
    { cause: 'Unmetered air (a vacuum leak)', reason: 'Lean at idle that improves at 2 500 rpm: a leak is a bigger share of the small idle airflow.', checks: [smokeTest, reread] },
  ],
  lean_all_speeds: [
    { cause: 'Fuel supply short (pressure or volume)', reason: 'Lean at every speed means too little fuel for the air the engine measures.', checks: [fuelPressure] },
    { cause: 'Air-flow sensor reading low', reason: 'A sensor that under-reads makes the computer meter too little fuel at every speed.', checks: [airFlow] },
    { cause: 'Exhaust leak ahead of the oxygen sensor', reason: 'Outside air pulled in at the leak makes the sensor see lean that is not there.', checks: [exhaustLeak] },
  ],
  lean_at_2500: [
    { cause: 'Fuel delivery falling behind at higher flow', reason: 'Normal at idle but lean at 2 500 rpm: the supply or a restricted filter cannot keep up.', checks: [fuelPressure] },
    { cause: 'Air-flow sensor reading low at higher flow', reason: 'An error that grows with airflow shows up off idle.', checks: [airFlow] },
  ],
  lean_speed_unknown: [
    { cause: 'Lean, source not yet told apart', reason: 'Trims at both idle and 2 500 rpm tell a vacuum leak (improves with speed) from a fuel or sensor fault (lean at all speeds).', checks: [{ text: 'Read the trims at the speed not yet read (idle or about 2 500 rpm).', cautions: RUN }] },
  ],
  rich: [
    { cause: 'Too much fuel: pressure high, an injector leaking, or purge flow at idle', reason: 'The computer is taking fuel away, so more arrives than the air needs (common practice).', checks: [fuelPressure, { text: 'Check the evaporative purge valve closes at idle.', cautions: RUN }] },
    { cause: 'Air-flow sensor reading high', reason: 'A sensor that over-reads makes the computer add fuel the engine does not need.', checks: [airFlow] },
  ],
};

/** Causes for how far the fault reaches; `bank` names the odd bank out for one-bank faults. */
function byScope(scope: TrimScope, direction: 'lean' | 'rich' | 'none', bank?: number): LikelyCause[] {
  if (scope === 'one_bank' && direction === 'lean') {
    return [{
      cause: `A cause on bank ${bank}: intake gasket or port, injector seal, or that bank's oxygen sensor`,
      reason: 'Only one bank is lean, so the cause serves that bank alone.',
      checks: [{ text: `Smoke-test bank ${bank}'s intake ports and gasket, check its injector seals, and check its oxygen sensor and wiring.`, cautions: ['smoke_test'] }],
    }];
  }
  if (scope === 'one_bank' && direction === 'rich') {
    return [{ cause: `A cause on bank ${bank}: a leaking injector or that bank's oxygen sensor`, reason: 'Only one bank is rich, so the cause serves that bank alone (common practice).', checks: [{ text: `Check bank ${bank}'s injectors for leaks and its oxygen sensor and wiring.`, cautions: ['fuel_pressure'] }] }];
  }
  if (scope === 'both_banks' && direction === 'lean') {
    return [{
      cause: 'A cause both banks share: plenum, throttle-body gasket, vacuum hose, PCV, brake booster line, fuel supply or air-flow sensor',
      reason: 'Both banks are lean, so look at what feeds both.',
      checks: [smokeTest, fuelPressure],
    }];
  }
  if (scope === 'both_banks' && direction === 'rich') {
    return [{ cause: 'A cause both banks share: fuel pressure, purge flow or air-flow sensor', reason: 'Both banks are rich, so look at what feeds both (common practice).', checks: [fuelPressure] }];
  }
  if (scope === 'banks_disagree') {
    return [{
      cause: "Oxygen sensor connectors swapped between banks, or one bank's sensor misreading",
      reason: 'One bank lean and the other rich rarely has a mechanical cause; sensor wiring moved in the install is a common slip (common practice, from memory).',
      checks: [{ text: 'Trace each oxygen sensor harness to its own bank and compare the two sensors at 2 500 rpm.', cautions: RUN }],
    }];
  }
  return [];
}

/** Ranked causes for a trim judgement: the worst bank's pattern first, then the scope. */
export function likelyTrimCauses(pattern: TrimPattern, scope: TrimScope, bank?: number): LikelyCause[] {
  const direction = pattern === 'rich' ? 'rich' : pattern === 'normal' || pattern === 'not_enough_readings' ? 'none' : 'lean';
  return [...BY_PATTERN[pattern], ...byScope(scope, direction, bank)];
}
