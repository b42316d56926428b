export { RevisionMoves, type RevisionMovesProps } from './RevisionMoves';
export { CommentThread, type CommentThreadProps } from './CommentThread';
export { anchorText } from './anchor-text';
