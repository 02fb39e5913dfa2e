// Reads a numeric id from the address; anything else means "no such page".
import { idParam } from '../../shared/api/schemas';

export function parseIdParam(raw: string | undefined): number | null {
  const parsed = idParam.safeParse(raw);
  return parsed.success ? parsed.data : null;
}
