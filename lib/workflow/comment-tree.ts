/** Threads from a flat list of comments: each comment under its parent, oldest first at every level. */

export interface ThreadedItem {
  id: string;
  parentId: string | null;
  createdAt: string;
}

export interface ThreadNode<C extends ThreadedItem> {
  comment: C;
  replies: ThreadNode<C>[];
}

/** A reply whose parent is not in the list (e.g. still loading) is shown as a thread of its own. */
export function buildThreads<C extends ThreadedItem>(comments: readonly C[]): ThreadNode<C>[] {
  const nodes = new Map<string, ThreadNode<C>>();
  for (const comment of comments) nodes.set(comment.id, { comment, replies: [] });
  const roots: ThreadNode<C>[] = [];
  for (const node of nodes.values()) {
    const parent = node.comment.parentId ? nodes.get(node.comment.parentId) : undefined;
    if (parent && parent !== node) parent.replies.push(node);
    else roots.push(node);
  }
  const byTime = (a: ThreadNode<C>, b: ThreadNode<C>) => a.comment.createdAt.localeCompare(b.comment.createdAt);
  const sortDeep = (list: ThreadNode<C>[]) => {
    list.sort(byTime);
    for (const n of list) sortDeep(n.replies);
  };
  sortDeep(roots);
  return roots;
}
