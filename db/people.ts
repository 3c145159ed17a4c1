import type { PersonDto } from "../contracts/dto";
/** A person from a left-joined user's id and name; null when the account is gone (the join found no one). */
export const person = (id: string | null, name: string | null): PersonDto | null => (id && name ? { id, name } : null);
