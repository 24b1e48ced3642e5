export { wetBulbF, PsychrometricInputError } from './wet-bulb';
