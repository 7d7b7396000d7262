import { pieceStages } from '@gelpoint/contracts';
import type { SelectOption } from '../../../components/ui/Select';
import { stageWords } from '../utils/stage-words';

export const stageOptions: readonly SelectOption[] = pieceStages.map((stage) => ({ value: stage, label: stageWords[stage].label }));
