/** Words for the lineside sections shared by the wizard, the review, the briefing, the sheet and the pack. */
export const LINE_CAUTION =
  "Heftwise records the arrangements for working near the line; it does not plan protection from trains. That follows the infrastructure manager's rules and is done by its competent people.";
