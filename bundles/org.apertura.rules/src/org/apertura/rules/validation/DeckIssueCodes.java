/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.validation;

/**
 * Every issue code the deck language reports, in one place. Tests and quick fixes match on these
 * codes, never on message text. The codes are stable strings prefixed {@code org.apertura.rules.}.
 */
public final class DeckIssueCodes {

	private static final String PREFIX = "org.apertura.rules.";

	/** A reference names a layer that no deck in the import closure declares. */
	public static final String UNKNOWN_LAYER = PREFIX + "unknownLayer";
	/** A reference names an option that no deck in the import closure declares. */
	public static final String UNKNOWN_OPTION = PREFIX + "unknownOption";
	/** Any other unresolvable reference. */
	public static final String UNKNOWN_REFERENCE = PREFIX + "unknownReference";
	/** The text does not follow the grammar (also used for unreadable or binary input). */
	public static final String SYNTAX_ERROR = PREFIX + "syntaxError";
	/** Two layers with one name across the import closure. */
	public static final String DUPLICATE_LAYER = PREFIX + "duplicateLayer";
	/** Two layers share one GDS layer/datatype pair (warning). */
	public static final String DUPLICATE_GDS_NUMBER = PREFIX + "duplicateGdsNumber";
	/** Two options with one name across the import closure. */
	public static final String DUPLICATE_OPTION = PREFIX + "duplicateOption";
	/** The same rule (kind, and condition or enclosed layer where it has one) twice in one block. */
	public static final String DUPLICATE_RULE = PREFIX + "duplicateRule";
	/** Two rule blocks for the same layer in one option (or twice at deck level). */
	public static final String DUPLICATE_LAYER_BLOCK = PREFIX + "duplicateLayerBlock";
	/** The same optics setting twice in one option. */
	public static final String DUPLICATE_SETTING = PREFIX + "duplicateSetting";
	/** A length or area written as a plain number. */
	public static final String MISSING_UNIT = PREFIX + "missingUnit";
	/** A quantity of the wrong kind (an area where a length is expected, adding nm to nm², ...). */
	public static final String UNIT_MISMATCH = PREFIX + "unitMismatch";
	/** A value that must be positive is zero or negative. */
	public static final String NON_POSITIVE_VALUE = PREFIX + "nonPositiveValue";
	/** A value that is not a whole multiple of the manufacturing grid (or of the database unit). */
	public static final String OFF_GRID = PREFIX + "offGrid";
	/** Width plus spacing exceeds the pitch of the same layer. */
	public static final String WIDTH_SPACING_EXCEED_PITCH = PREFIX + "widthSpacingExceedPitch";
	/** A pitch whose k1 = (pitch x split / 2) x NA / lambda is below the physical limit 0.25. */
	public static final String K1_BELOW_LIMIT = PREFIX + "k1BelowLimit";
	/** A pitch whose k1 is below the option's practical k1 floor (warning). */
	public static final String K1_BELOW_FLOOR = PREFIX + "k1BelowFloor";
	/** Same-mask spacing on a layer patterned with a single mask. */
	public static final String SAME_MASK_ON_SINGLE_MASK = PREFIX + "sameMaskOnSingleMask";
	/** Same-mask spacing smaller than the different-mask spacing (warning). */
	public static final String SAME_MASK_BELOW_SPACING = PREFIX + "sameMaskBelowSpacing";
	/** An option extends itself, directly or through others. */
	public static final String INHERITANCE_CYCLE = PREFIX + "inheritanceCycle";
	/** A deck imports itself, directly or through others. */
	public static final String IMPORT_CYCLE = PREFIX + "importCycle";
	/** An import that cannot be loaded. */
	public static final String IMPORT_NOT_FOUND = PREFIX + "importNotFound";
	/** Rule expressions that refer to one another in a circle. */
	public static final String EXPRESSION_CYCLE = PREFIX + "expressionCycle";
	/** An expression refers to a rule the layer does not have under the option being resolved. */
	public static final String UNDEFINED_RULE_REFERENCE = PREFIX + "undefinedRuleReference";
	/** An expression cannot be evaluated (division by zero, nesting too deep, ...). */
	public static final String EVALUATION_FAILED = PREFIX + "evaluationFailed";
	/** The root deck has no technology header. */
	public static final String MISSING_TECHNOLOGY = PREFIX + "missingTechnology";
	/** The technology header lacks the database unit or the manufacturing grid. */
	public static final String MISSING_UNITS_HEADER = PREFIX + "missingUnitsHeader";
	/** The manufacturing grid is not a whole multiple of the database unit. */
	public static final String GRID_NOT_MULTIPLE_OF_UNIT = PREFIX + "gridNotMultipleOfUnit";
	/** Imported decks declare a different database unit or grid. */
	public static final String CONFLICTING_TECHNOLOGY = PREFIX + "conflictingTechnology";
	/** An option lacks (also through inheritance) a required optics setting. */
	public static final String MISSING_OPTICS = PREFIX + "missingOptics";
	/** An optics setting outside its physical range (NA in (0, 2), k1 floor in [0.25, 1], ...). */
	public static final String OPTICS_OUT_OF_RANGE = PREFIX + "opticsOutOfRange";
	/** A pitch on a layer that is not a line layer. */
	public static final String PITCH_ON_NON_LINE_LAYER = PREFIX + "pitchOnNonLineLayer";
	/** A line layer without a preferred direction. */
	public static final String MISSING_DIRECTION = PREFIX + "missingDirection";
	/** A preferred direction on a cut or other layer (warning). */
	public static final String DIRECTION_ON_NON_LINE_LAYER = PREFIX + "directionOnNonLineLayer";
	/** Litho-etch with fewer than 2 or more than 4 masks, or spacer division other than 2 or 4. */
	public static final String INVALID_PATTERNING = PREFIX + "invalidPatterning";
	/** A wafer-side value times the demagnification is below the mask-side minimum. */
	public static final String MASK_FEATURE_TOO_SMALL = PREFIX + "maskFeatureTooSmall";
	/** Density bounds outside 0..100 % or minimum above maximum. */
	public static final String DENSITY_RANGE = PREFIX + "densityRange";
	/** A density step larger than its window (warning). */
	public static final String DENSITY_STEP_EXCEEDS_WINDOW = PREFIX + "densityStepExceedsWindow";
	/** A layer encloses itself. */
	public static final String ENCLOSURE_OF_SELF = PREFIX + "enclosureOfSelf";
	/** Max width below min width. */
	public static final String MAX_WIDTH_BELOW_WIDTH = PREFIX + "maxWidthBelowWidth";
	/** A number that does not fit (for instance a GDS layer beyond 65535). */
	public static final String NUMBER_OUT_OF_RANGE = PREFIX + "numberOutOfRange";
	/** The file could not be read, or something unexpected happened while loading. */
	public static final String LOAD_FAILED = PREFIX + "loadFailed";

	private DeckIssueCodes() {
	}
}
