import type { ClassLessonView } from '../../../../shared/api/lessons';

/**
 * What a lesson page needs, the same whether it comes from the workspace (signed in) or
 * from a class link (signed out): the definition, its prompts, the profile's parameters
 * and the species card.
 */
export type LessonContent = ClassLessonView;
