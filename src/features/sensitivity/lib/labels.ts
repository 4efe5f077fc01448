export { inputLabel, optionLabel, shortName } from '../../../lib/scenario-labels';
