// How long a supply must carry its load from the standby battery, and the margin applied on top.

export interface StandbyProfile {
  id: string;
  label: string;
  /** Hours at rest on battery. */
  standbyH: number;
  /** Minutes in alarm after the standby period. */
  alarmMin: number;
  /** Where the figures come from. */
  source: string;
  note: string;
  /** A fire (life-safety) system profile: battery findings carry the fire-code caution. */
  lifeSafety: boolean;
  defaultSafetyFactor: number;
}

export interface SafetyFactorOption {
  value: number;
  label: string;
  source: string;
}

export const safetyFactors: SafetyFactorOption[] = [
  {
    value: 1.25,
    label: "1.25: derating commonly applied in fire alarm battery calculations (North American practice)",
    source: "common practice, no published source",
  },
  { value: 1.2, label: "1.20: the 20 % margin many intruder installers add", source: "common practice, no published source" },
];

export const CUSTOM_PROFILE_ID = "custom";

export const standbyProfiles: StandbyProfile[] = [
  {
    id: "nfpa72-fire",
    label: "Fire alarm: 24 h standby, then 5 min of alarm",
    standbyH: 24,
    alarmMin: 5,
    source: "NFPA 72 (secondary power supply)",
    note: "Local fire codes and the authority having jurisdiction may ask for more; check before relying on this figure.",
    lifeSafety: true,
    defaultSafetyFactor: 1.25,
  },
  {
    id: "nfpa72-voice",
    label: "Fire alarm with voice evacuation: 24 h standby, then 15 min of alarm",
    standbyH: 24,
    alarmMin: 15,
    source: "NFPA 72 (secondary power supply)",
    note: "Local fire codes and the authority having jurisdiction may ask for more; check before relying on this figure.",
    lifeSafety: true,
    defaultSafetyFactor: 1.25,
  },
  // EN 50131-6-style intruder profiles. The hours are from memory; the alarm time is ours (15 min, common practice, no published source).
  {
    id: "intruder-grade-2",
    label: "Intruder, grade 1–2: 12 h standby (EN 50131-6 style, from memory)",
    standbyH: 12,
    alarmMin: 15,
    source: "EN 50131-6 style, from memory",
    note: "Standby hours from memory; 15 min of alarm is common practice, no published source. Check the standard and the insurer's requirements.",
    lifeSafety: false,
    defaultSafetyFactor: 1.2,
  },
  {
    id: "intruder-grade-3-30h",
    label: "Intruder, higher grade: 30 h standby (EN 50131-6 style, from memory)",
    standbyH: 30,
    alarmMin: 15,
    source: "EN 50131-6 style, from memory",
    note: "Standby hours from memory (the shorter higher-grade figure, where the supply fault is reported onward); 15 min of alarm is common practice, no published source.",
    lifeSafety: false,
    defaultSafetyFactor: 1.2,
  },
  {
    id: "intruder-grade-3-60h",
    label: "Intruder, higher grade: 60 h standby (EN 50131-6 style, from memory)",
    standbyH: 60,
    alarmMin: 15,
    source: "EN 50131-6 style, from memory",
    note: "Standby hours from memory (the longer higher-grade figure); 15 min of alarm is common practice, no published source.",
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
