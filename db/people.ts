/** A person as lists show them: who saved, invited, made a link. */
export interface PersonDto {
  id: string;
  name: string;
}

/** A person from a left-joined user's id and name; null when the account is gone (the join found no one). */
export const person = (id: string | null, name: string | null): PersonDto | null => (id && name ? { id, name } : null);
