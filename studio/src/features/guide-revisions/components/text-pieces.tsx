import type { TextPiece } from '../api/queries';
import classes from './revisions.module.css';

/**
 * Words of a changed text in reading order. Inserted words are <ins>, deleted ones <del>: screen readers can
 * announce them, and besides colour they are underlined or struck through, with a hidden "added"/"removed" word.
 */
export function TextPieces({ pieces }: { pieces: TextPiece[] }) {
  return (
    <span className={classes.pieces}>
      {pieces.map((piece, index) =>
        piece.change === 'added' ? (
          <ins key={index} className={classes.added}>
            <span className={classes.visuallyHidden}>[added: </span>
            {piece.text}
            <span className={classes.visuallyHidden}>]</span>
          </ins>
        ) : piece.change === 'removed' ? (
          <del key={index} className={classes.removed}>
            <span className={classes.visuallyHidden}>[removed: </span>
            {piece.text}
            <span className={classes.visuallyHidden}>]</span>
          </del>
        ) : (
          <span key={index}>{piece.text}</span>
        ),
      )}
    </span>
  );
}
