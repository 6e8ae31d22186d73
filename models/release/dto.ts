/** What the release pages and routes answer with (plain data). */

export interface PermissionDto {
  id: number;
  name: string;
  authority: string;
  reference: string | null;
  grantedOn: string | null;
  conditions: string | null;
  recorded: boolean;
  recordedByName: string | null;
  recordedAt: string | null;
  document: { name: string; sha256: string; url: string } | null;
}

export interface PermissionsDto {
  plan: { noneRequired: boolean; reason: string } | null;
  permissions: PermissionDto[];
  you: { mayRecord: boolean };
}

export interface ConditionsDto {
  /** The approved-as-noted decision the conditions belong to, or null when there is none. */
  decision: { id: number; number: number } | null;
  conditions: { index: number; text: string; answer: string | null; answeredByName: string | null; answeredAt: string | null }[];
  you: { mayAnswer: boolean };
}
