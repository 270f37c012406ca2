/** Public surface of the notebook library (see docs/notebook.md). */
export * from "./block-kinds";
export { FIELDS, fieldsOf, fieldOf, fieldActive, fieldLabel } from "./blocks";
export type { FieldDef, NumberField, ListField, ChoiceField, TextField } from "./fields";
export * from "./model";
export { createScenarioDoc, type TemplateOptions } from "./templates";
export { compile, compileDoc, SCENARIO_FORMAT, type CompileInput, type LibraryCycle, type LibraryFullLoad, type LibraryItemData, type LibraryOcv, type LibraryResolver, type CompileResult, type CompileMessage, type Source, type SourceTable } from "./compile";
export { evaluateValue, splitBracketUnit, referencedNames, validParameterName, EMPTY_ENV, type Environment, type ValueSpec, type ValueResult } from "./expressions";
export { evaluateParameters, evaluateParameterText, type ParameterDef, type ParameterResult, type ParameterSet } from "./parameters";
export { parseList, splitList, LIST_MAX_ITEMS, type ListResult } from "./lists";
export { findUnit, unitsOf, parseMeasured, normaliseSymbols, toSI, fromSI, type UnitDef, type Measured } from "./units";
export { QUANTITIES, describeDimension, type Quantity, type Dimension } from "./dimensions";
export { FORMULA_MAX_LENGTH, UNARY_FUNCTIONS, CALL_FUNCTIONS, CONSTANTS } from "./safe-parser";
export { evaluateField, type FieldOutcome } from "./compile-fields";
