// Every migration, oldest first. `npm run db:generate -- Name` appends here; landed migrations are never edited.
import { Foundation1796166861733 } from './1796166861733-foundation';
export const migrations: Function[] = [Foundation1796166861733];
