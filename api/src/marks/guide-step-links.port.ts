/**
 * What marks need to know of guides: whether a step a mark links to belongs to the workshop. The guides
 * domain owns those tables and provides this (guides/guides-ports.module.ts), so marks neither read them
 * nor import guides, which show marks in their steps.
 */
export abstract class GuideStepLinks {
  abstract stepInWorkshop(workshopId: string, stepId: string): Promise<boolean>;
}
