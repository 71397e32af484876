/**
 * Likely causes for an idle vacuum verdict and the needle's behaviour, ranked
 * most likely first for an engine just back from an install. Needle readings
 * follow U.S. Army subcourse OD1001 (published) unless marked common practice.
 */
import type { EngineProfile, NeedleBehaviour } from './reading-kinds';
import type { NextCheck } from './cautions';
import type { VacuumVerdict } from './vacuum';

export interface LikelyCause {
  cause: string;
  reason: string;
  checks: NextCheck[];
}

const RUN: NextCheck['cautions'] = ['running_engine'];

const smokeTest: NextCheck = { text: 'Smoke-test the intake with the engine off: manifold and throttle-body gaskets, port plugs, sensor seals, every hose touched in the install.', cautions: ['smoke_test'] };
const readTrims: NextCheck = { text: 'Read short and long term fuel trims for each bank at idle and at about 2 500 rpm.', cautions: RUN };

const OVERLAP: LikelyCause = {
  cause: 'Camshaft overlap',
  reason: 'A long-duration, high-overlap camshaft idles lower and less steadily (common practice).',
  checks: [{ text: "Compare with the camshaft maker's idle vacuum figure before chasing a fault.", cautions: [] }],
};

const BY_NEEDLE: Readonly<Record<Exclude<NeedleBehaviour, 'steady'>, LikelyCause[]>> = {
  floating: [
    { cause: 'Mixture wrong (too rich or too lean)', reason: 'A needle floating slowly, around 12–16 inHg at sea level, points to the mixture.', checks: [readTrims] },
  ],
  dropping_regularly: [
    {
      cause: 'One cylinder losing: misfire, leaking valve or head gasket',
      reason: 'A regular drop of 3–6 inHg happens each time the same cylinder fails to seal or fire.',
      checks: [
        { text: 'Read misfire counts per cylinder, or do a cylinder balance test, to find the cylinder.', cautions: RUN },
        { text: 'Compression or leak-down test on that cylinder.', cautions: [] },
      ],
    },
  ],
  dropping_now_and_then: [
    { cause: 'Sticking valve', reason: 'An occasional drop comes from a valve that now and then fails to close.', checks: [{ text: 'Watch the gauge and listen at the valve covers for a tick that matches the drops.', cautions: RUN }] },
    { cause: 'Intermittent ignition fault', reason: 'A spark that misses now and then drops the needle at random.', checks: [{ text: 'Inspect plug leads, coil connectors and grounds disturbed in the install; watch misfire counts.', cautions: RUN }] },
  ],
  sinking_at_2500: [
    {
      cause: 'Restricted exhaust',
      reason: 'Vacuum that sinks slowly while held at about 2 500 rpm means the exhaust cannot get out.',
      checks: [{ text: 'Measure exhaust back pressure ahead of the catalytic converter; look for crushed pipes or a blocked converter.', cautions: RUN }],
    },
  ],
  fluttering: [
    { cause: 'Worn valve guides', reason: 'A fast flutter between about 14 and 19 inHg at idle points to worn guides (common practice, no published source).', checks: [{ text: 'Look for blue smoke at start-up and do a leak-down test.', cautions: RUN }] },
  ],
};

const BY_LEVEL: Readonly<Record<Exclude<VacuumVerdict, 'within_range'>, LikelyCause[]>> = {
  very_low: [
    {
      cause: 'Large manifold leak',
      reason: 'A steady reading far below normal (under about 5 inHg at sea level) means a big opening: a hose off, a cap missing, a plug or sensor not seated (common practice).',
      checks: [{ text: 'With the engine idling, look and listen around the manifold for a hiss; check each hose, cap and plug touched in the install.', cautions: RUN }, smokeTest],
    },
  ],
  low: [
    { cause: 'Leak at the intake manifold or throttle-body gasket', reason: 'A leak shared by all cylinders lowers the reading evenly; gaskets disturbed in the install come first.', checks: [smokeTest] },
    { cause: 'Late valve timing', reason: 'Cam timing a tooth out after a camshaft or timing-set job lowers vacuum on every cylinder.', checks: [{ text: "Check the timing marks against the camshaft maker's card.", cautions: [] }] },
    { cause: 'Late ignition timing', reason: 'Spark too late lowers vacuum steadily on all cylinders.', checks: [{ text: 'Check base ignition timing at idle with a timing light or scan tool.', cautions: RUN }] },
    { cause: 'Even ring wear', reason: 'Worn rings on every cylinder lower vacuum steadily; least likely just after an install.', checks: [{ text: 'Compression test on every cylinder (fuel and ignition disabled).', cautions: RUN }] },
  ],
  high: [
    { cause: 'Profile or altitude setting does not match the engine', reason: 'The expected band depends on the camshaft and the air pressure; a milder profile or a lower altitude than the real one moves it.', checks: [{ text: "Confirm the engine profile and the shop's altitude, or enter a measured barometric pressure.", cautions: [] }] },
    { cause: 'Reading taken as the throttle closed', reason: 'Closing the throttle overshoots to about 25 inHg before settling.', checks: [{ text: 'Read again with the engine settled at idle for a minute.', cautions: RUN }] },
    { cause: 'Gauge reading high', reason: 'A gauge can drift; a scan tool gives an independent figure.', checks: [{ text: 'Compare the gauge with MAP on a scan tool: vacuum = barometric pressure − MAP.', cautions: RUN }] },
  ],
};

/** Ranked likely causes: what the needle shows first (most specific), then what the level shows. */
export function likelyVacuumCauses(verdict: VacuumVerdict, needle: NeedleBehaviour | undefined, profile: EngineProfile): LikelyCause[] {
  const out: LikelyCause[] = [];
  if (profile === 'long_duration_cam' && (needle === 'floating' || needle === 'fluttering')) out.push(OVERLAP);
  if (needle && needle !== 'steady') out.push(...BY_NEEDLE[needle]);
  if (verdict !== 'within_range') out.push(...BY_LEVEL[verdict]);
  return out;
}
