export { ROLE_IN_A_SENTENCE, ROLE_LABELS } from '../../../../shared/types';
