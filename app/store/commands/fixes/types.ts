import type { Draft } from 'immer';
import type { Design } from '../../../../rules/model/index.ts';
import type { Refusal } from '../command.ts';

/**
 * One way to resolve a finding, as a pure recipe: `apply` mutates a draft of the design (the
 * store runs it through its one commit path, so it is one undo step). It reads everything it
 * needs from the draft by id, so a fix made for an older version of the design either still
 * fits or refuses.
 */
export interface QuickFix {
  /** Unique among the fixes of one finding: `translator`, `ttl-inputs`, `pull-up`, … */
  readonly id: string;
  /** The id of the finding it answers. */
  readonly finding: string;
  /** A short imperative title, also the undo step's name. */
  readonly title: string;
  /** One sentence: what the fix does and why it resolves the finding. */
  readonly sentence: string;
  /**
   * The fix records a claim about a part that only its datasheet can confirm (a pin specified
   * for partial power-down, an input that tolerates 5 V): ask the user before applying.
   */
  readonly needsConfirmation?: boolean;
  /**
   * What the user should do right after applying: complete a waiver's placeholder note.
   * The panel opens that waiver for editing.
   */
  readonly followUp?: { readonly kind: 'complete-waiver-note'; readonly net: string; readonly rule: string };
  /**
   * The figures the fix was worked out from and those its circuit gives (values, margins, edge
   * time), shown with the fix before it is applied.
   */
  readonly figures?: readonly FixFigure[];
  /**
   * The fix cannot be worked out from what the design states: what it would need. The menu shows
   * it instead of Apply, and `apply` refuses with it.
   */
  readonly unavailable?: string;
  apply(draft: Draft<Design>): Refusal | undefined;
}

/** One figure of a fix: `label` says what it is and at which corner, `value` is formatted with its unit. */
export interface FixFigure {
  readonly label: string;
  readonly value: string;
}
