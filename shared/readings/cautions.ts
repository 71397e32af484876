/**
 * Safety notes shown above any next check that needs them. Words chosen for a
 * technician beside the car; local codes and licensed practice come first.
 */
export const CAUTION_KINDS = ['running_engine', 'fuel_pressure', 'smoke_test'] as const;
export type CautionKind = (typeof CAUTION_KINDS)[number];

export interface Caution {
  kind: CautionKind;
  title: string;
  points: string[];
}

export const CAUTIONS: Readonly<Record<CautionKind, Caution>> = {
  running_engine: {
    kind: 'running_engine',
    title: 'Engine running',
    points: [
      'Run the engine outdoors or with the exhaust extraction connected: exhaust gas indoors can kill (carbon monoxide has no smell).',
      'Parking brake on, transmission in park or neutral, wheels chocked.',
      'Keep hands, hair, sleeves, tools and test leads clear of belts, pulleys and the cooling fan; an electric fan can start on its own.',
      'Exhaust manifolds, pipes, the catalytic converter and the radiator get hot enough to burn within minutes.',
    ],
  },
  fuel_pressure: {
    kind: 'fuel_pressure',
    title: 'Fuel under pressure',
    points: [
      'The fuel rail stays under pressure after the engine stops: relieve it the way the service information says before opening a fitting.',
      'Wrap the test port in a rag, wear eye protection, and keep sparks and flames away.',
      'Check every fitting you touched for leaks with the key on before starting the engine.',
    ],
  },
  smoke_test: {
    kind: 'smoke_test',
    title: 'Smoke testing',
    points: [
      'Engine off and cool, ignition off.',
      'No flames or sparks nearby; use a non-flammable smoke medium and a ventilated area.',
      'Keep the test pressure at about 1 psi or less, wear eye protection, and use nitrogen or another inert gas, not shop air, for fuel-vapour (EVAP) work.',
    ],
  },
};

/** One suggested check, with the cautions it needs. */
export interface NextCheck {
  text: string;
  cautions: CautionKind[];
}

/** The distinct cautions a list of checks needs, in a fixed order. */
export function cautionsFor(checks: readonly NextCheck[]): Caution[] {
  const wanted = new Set(checks.flatMap((c) => c.cautions));
  return CAUTION_KINDS.filter((k) => wanted.has(k)).map((k) => CAUTIONS[k]);
}

/** Check texts without duplicates, first mention wins. */
export function uniqueChecks(checks: readonly NextCheck[]): NextCheck[] {
  const seen = new Set<string>();
  return checks.filter((c) => (seen.has(c.text) ? false : (seen.add(c.text), true)));
}
