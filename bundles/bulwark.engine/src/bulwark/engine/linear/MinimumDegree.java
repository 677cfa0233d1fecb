package bulwark.engine.linear;

import java.util.Arrays;

/**
 * A fill-reducing elimination order: minimum degree on the graph of A + Aᵀ (Tinney and Walker, "Direct
 * solutions of sparse network equations by optimally ordered triangular factorization", Proc. IEEE 55(11),
 * 1967, scheme 2; the graph form as in George and Liu, Computer Solution of Large Sparse Positive Definite
 * Systems, 1981, ch. 5). The elimination graph is kept explicitly with sorted neighbour arrays; ties go to
 * the lower index, so the order is deterministic. Computed once per circuit.
 */
public final class MinimumDegree {
	private MinimumDegree() {
	}

	/** order[k] = the column to eliminate k-th. */
	public static int[] order(CscMatrix a) {
		int n = a.n;
		int[][] adj = symmetricGraph(a);
		int[] degree = new int[n];
		for (int i = 0; i < n; i++) {
			degree[i] = adj[i].length;
		}
		boolean[] eliminated = new boolean[n];
		int[] order = new int[n];
		// buckets of nodes by degree, as linked lists, for O(1) retrieval of a minimum-degree node
		int[] head = new int[n + 1];
		int[] next = new int[n];
		int[] prev = new int[n];
		Arrays.fill(head, -1);
		for (int i = n - 1; i >= 0; i--) {
			insert(head, next, prev, degree[i], i);
		}
		int minDegree = 0;
		int[] mark = new int[n];
		int stamp = 0;
		for (int k = 0; k < n; k++) {
			while (head[minDegree] < 0) {
				minDegree++;
			}
			int v = lowest(head[minDegree], next);
			remove(head, next, prev, degree[v], v);
			eliminated[v] = true;
			order[k] = v;
			// neighbours of v still in the graph become a clique
			int[] nv = live(adj[v], eliminated);
			for (int u : nv) {
				stamp++;
				int[] nu = adj[u];
				for (int w : nu) {
					if (!eliminated[w]) {
						mark[w] = stamp;
					}
				}
				int extra = 0;
				for (int w : nv) {
					if (w != u && mark[w] != stamp) {
						extra++;
					}
				}
				int[] merged = new int[nu.length + extra];
				int m = 0;
				for (int w : nu) {
					if (!eliminated[w]) {
						merged[m++] = w;
					}
				}
				for (int w : nv) {
					if (w != u && mark[w] != stamp) {
						merged[m++] = w;
					}
				}
				merged = Arrays.copyOf(merged, m);
				Arrays.sort(merged);
				adj[u] = merged;
				remove(head, next, prev, degree[u], u);
				degree[u] = m;
				insert(head, next, prev, m, u);
				minDegree = Math.min(minDegree, m);
			}
			adj[v] = new int[0];
		}
		return order;
	}

	private static int[][] symmetricGraph(CscMatrix a) {
		int n = a.n;
		java.util.BitSet[] sets = new java.util.BitSet[n];
		for (int i = 0; i < n; i++) {
			sets[i] = new java.util.BitSet();
		}
		for (int j = 0; j < n; j++) {
			for (int p = a.colStart[j]; p < a.colStart[j + 1]; p++) {
				int i = a.rowIndex[p];
				if (i != j) {
					sets[i].set(j);
					sets[j].set(i);
				}
			}
		}
		int[][] adj = new int[n][];
		for (int i = 0; i < n; i++) {
			adj[i] = sets[i].stream().toArray();
		}
		return adj;
	}

	private static int[] live(int[] nodes, boolean[] eliminated) {
		int[] out = new int[nodes.length];
		int m = 0;
		for (int w : nodes) {
			if (!eliminated[w]) {
				out[m++] = w;
			}
		}
		return Arrays.copyOf(out, m);
	}

	private static int lowest(int first, int[] next) {
		int best = first;
		for (int i = next[first]; i >= 0; i = next[i]) {
			best = Math.min(best, i);
		}
		return best;
	}

	private static void insert(int[] head, int[] next, int[] prev, int d, int v) {
		next[v] = head[d];
		prev[v] = -1;
		if (head[d] >= 0) {
			prev[head[d]] = v;
		}
		head[d] = v;
	}

	private static void remove(int[] head, int[] next, int[] prev, int d, int v) {
		if (prev[v] >= 0) {
			next[prev[v]] = next[v];
		} else {
			head[d] = next[v];
		}
		if (next[v] >= 0) {
			prev[next[v]] = prev[v];
		}
	}
}
