// How long a supply must carry its load from the standby battery, and the margin applied on top.

/** Said on screen beside every standard-based figure: clause numbers and periods move between editions. */
export const CHECK_EDITION = "Check against the edition your authority uses.";

export interface StandbyProfile {
  id: string;
  label: string;
  /** Hours at rest on battery. */
  standbyH: number;
  /** Minutes in alarm after the standby period. */
  alarmMin: number;
  /** The standard and clause the figures follow, as shown on screen. */
  source: string;
  /** Shown on screen after the source; ends with CHECK_EDITION where a standard is named. */
  note: string;
  /** A fire (life-safety) system profile: battery findings carry the fire-code caution. */
  lifeSafety: boolean;
  defaultSafetyFactor: number;
}

export interface SafetyFactorOption {
  value: number;
  label: string;
  /** Where the factor comes from, as shown on screen. */
  source: string;
}

// Neither factor is set by a clause we can cite: both are common practice, no published source. The screen says
// what each allows for and sends the designer to the edition their authority uses.
export const safetyFactors: SafetyFactorOption[] = [
  {
    value: 1.25,
    label: "1.25: derating commonly applied in fire alarm battery calculations",
    source: `allows for a battery that has aged to 80 % of its capacity (1 ÷ 0.8); trade practice, not a clause of a standard. ${CHECK_EDITION}`,
  },
  {
    value: 1.2,
    label: "1.20: the 20 % margin many intruder installers add",
    source: `trade practice, not a clause of a standard. ${CHECK_EDITION}`,
  },
];

export const CUSTOM_PROFILE_ID = "custom";

// NFPA 72, chapter 10 "Fundamentals", secondary power supply: 24 h quiescent load then 5 min of alarm, 15 min for
// in-building voice evacuation. The subsection number (10.6.7 in the 2013–2019 editions) is from memory.
const NFPA72_SOURCE = "NFPA 72, chapter 10, secondary power supply (10.6.7 in recent editions)";
const FIRE_NOTE = `Local fire codes and the authority having jurisdiction may ask for more. ${CHECK_EDITION}`;
// EN 50131-6 (intruder alarm power supplies), standby period by security grade: 12 h for grades 1–2; 60 h for
// grades 3–4, or 30 h where the supply fault is reported onward. The hours are from memory; the clause is not
// numbered here for that reason. The 15 min of alarm is ours (common practice, no published source).
const EN50131_SOURCE = "EN 50131-6, standby period by security grade";
const INTRUDER_ALARM_NOTE = "15 min of alarm is trade practice, not set by the standard; insurers may ask for more.";

export const standbyProfiles: StandbyProfile[] = [
  {
    id: "nfpa72-fire",
    label: "Fire alarm: 24 h standby, then 5 min of alarm (NFPA 72)",
    standbyH: 24,
    alarmMin: 5,
    source: NFPA72_SOURCE,
    note: FIRE_NOTE,
    lifeSafety: true,
    defaultSafetyFactor: 1.25,
  },
  {
    id: "nfpa72-voice",
    label: "Fire alarm with voice evacuation: 24 h standby, then 15 min of alarm (NFPA 72)",
    standbyH: 24,
    alarmMin: 15,
    source: NFPA72_SOURCE,
    note: FIRE_NOTE,
    lifeSafety: true,
    defaultSafetyFactor: 1.25,
  },
  {
    id: "intruder-grade-2",
    label: "Intruder, grade 1–2: 12 h standby (EN 50131-6)",
    standbyH: 12,
    alarmMin: 15,
    source: EN50131_SOURCE,
    note: `${INTRUDER_ALARM_NOTE} ${CHECK_EDITION}`,
    lifeSafety: false,
    defaultSafetyFactor: 1.2,
  },
  {
    id: "intruder-grade-3-30h",
    label: "Intruder, grade 3–4, supply fault reported onward: 30 h standby (EN 50131-6)",
    standbyH: 30,
    alarmMin: 15,
    source: EN50131_SOURCE,
    note: `The shorter higher-grade period, where a supply fault is reported onward. ${INTRUDER_ALARM_NOTE} ${CHECK_EDITION}`,
    lifeSafety: false,
    defaultSafetyFactor: 1.2,
  },
  {
    id: "intruder-grade-3-60h",
    label: "Intruder, grade 3–4: 60 h standby (EN 50131-6)",
    standbyH: 60,
    alarmMin: 15,
    source: EN50131_SOURCE,
    note: `The longer higher-grade period. ${INTRUDER_ALARM_NOTE} ${CHECK_EDITION}`,
    lifeSafety: false,
    defaultSafetyFactor: 1.2,
  },
  {
    id: CUSTOM_PROFILE_ID,
    label: "Custom: standby hours and alarm minutes of your choosing",
    standbyH: 24,
    alarmMin: 5,
    source: "entered by the designer",
    note: "Figures entered for this layout.",
    lifeSafety: false,
    defaultSafetyFactor: 1.25,
  },
];

export function standbyProfile(id: string): StandbyProfile | undefined {
  return standbyProfiles.find((p) => p.id === id);
}

/** The profile's hours and minutes, with a custom profile's own figures when given. */
export function resolveStandby(power: { standbyProfileId: string; customStandbyH?: number; customAlarmMin?: number }): {
  profile: StandbyProfile | undefined;
  standbyH: number;
  alarmMin: number;
} {
  const profile = standbyProfile(power.standbyProfileId);
  if (profile?.id === CUSTOM_PROFILE_ID)
    return { profile, standbyH: power.customStandbyH ?? profile.standbyH, alarmMin: power.customAlarmMin ?? profile.alarmMin };
  return { profile, standbyH: profile?.standbyH ?? 24, alarmMin: profile?.alarmMin ?? 5 };
}
