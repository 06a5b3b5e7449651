/** Plain props the profile pages hand to the client components. */

export interface MechanismOption {
  id: string;
  title: string;
}

export interface ProfileOption {
  /** "standard" or a demo id */
  id: string;
  title: string;
  demo: boolean;
  note: string;
  range_km: [number, number];
}
