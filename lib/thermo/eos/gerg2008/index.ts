export { compileGerg2008, type GergMoleFractions } from './compile';
export { GERG_COMPONENT_IDS, GERG_COMPONENTS, type GergComponent, type GergComponentId } from './components';
