import type { Role } from "@/db/schema";

export type { Role };

export const KEY_SCOPES = ["compute", "profiles:write"] as const;
export type KeyScope = (typeof KEY_SCOPES)[number];

/** Limits of a key when none are given (and the most a member may give their own keys). */
export const DEFAULT_MONTHLY_UNITS = 10_000_000; // ten catalogs of a million redshifts a month
export const DEFAULT_PER_MINUTE = 120;
export const INVITATION_HOURS = 72;
export const MIN_PASSWORD_LENGTH = 12;

/** A signed-in person, as the console and the admin API see them. Never holds the password hash. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  teamId: string | null;
}

export interface Team {
  id: string;
  slug: string;
  name: string;
  createdAt: number;
}

export interface Member extends SessionUser {
  /** Invited but not yet joined (no password set). */
  pending: boolean;
  createdAt: number;
}

export type KeyStatus = "active" | "revoked" | "expired";

/** An API key as shown after creation: everything but the secret. */
export interface KeyView {
  id: string;
  teamId: string;
  userId: string | null;
  name: string;
  prefix: string;
  scopes: string[];
  monthlyUnits: number;
  perMinute: number;
  expiresAt: number | null;
  revokedAt: number | null;
  replacedBy: string | null;
  lastUsedAt: number | null;
  createdAt: number;
  status: KeyStatus;
}

/** A key and its secret, the one time the secret is shown. */
export interface IssuedKey {
  key: KeyView;
  secret: string;
}

export interface InvitationView {
  id: string;
  teamId: string;
  email: string;
  role: Role;
  invitedBy: string;
  expiresAt: number;
  usedAt: number | null;
  createdAt: number;
}
