/**
 * A part's category and source, apart from the entity: DTOs read these lists without loading the entity, whose
 * relation to its features is a cycle that fails ("Cannot access 'Part' before initialization") when a DTO is
 * the first to load it.
 */
export const PART_CATEGORIES = ['coupler', 'shaft', 'joint', 'bearing', 'bore', 'plate', 'boot', 'seal', 'fastener', 'other'] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];
export const PART_SOURCES = ['new', 'remanufactured', 'used', 'original_equipment'] as const;
export type PartSource = (typeof PART_SOURCES)[number];
