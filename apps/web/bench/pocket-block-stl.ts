import { pocketBlockStl as routedBlank } from '../e2e/support/test-mould';

/** The smallest mould that opens the 3D view: a 100 × 60 × 30 mm block with an 80 × 40 × 20 mm pocket. */
export const pocketBlockStl = (): Buffer => routedBlank({ block: [100, 60, 30], pocket: [80, 40, 20] }).bytes;
