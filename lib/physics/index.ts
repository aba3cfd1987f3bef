export { MODEL_VERSION, STANDARD_GRAVITY, METRES_PER_FOOT, KILOGRAMS_PER_POUND, VERIFICATION_THRESHOLD, MAX_SAMPLES, feetToMetres, poundsToKilograms } from './constants';
export { PhysicsInputError, PhysicsSolveError } from './errors';
export { isaAir, seawater, freshwater, customMedium, resolveMedium, type Medium, type MediumSpec, type Phase } from './media';
export { SHAPE_IDS, isShapeId, shapeProperties, shapeDimensions, shapeDescription, type ShapeId, type ShapeProperties } from './shapes';
export { DRAG_MODELS, isDragModel, dragCoefficients, terminalSpeed, dragForce, type DragModel, type DragCoefficients } from './drag';
export { closedFormFall, vacuumFall, linearFall, quadraticFall, linearQuadraticFall, type ClosedFormFall, type ClosedFormParams } from './closed-forms';
export { resolveDropCase, type DropCase, type ObjectSpec, type LayerSpec, type ResolvedCase } from './case';
export { reynoldsRegime, type ReynoldsRegime, type Verification } from './classification';
export { simulateDrop, type SimulateOptions, type DropResult, type DropSamples, type LayerReport, type EnergyAudit } from './fall';
