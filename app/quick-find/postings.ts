// Inverted lists packed into two flat typed arrays. Building 70,000 small arrays for 10,000
// entries cost more in garbage collection than the rest of the build; flat arrays cost nothing.

export type Postings = { docs: Int32Array; weights: Float32Array };

export class PostingTable {
  private ids = new Map<string, number>();
  private termList: string[] = [];
  private lastDoc: number[] = []; // per term: last entry added, for merging repeats
  private lastAt: number[] = []; // per term: where that posting sits in the pending arrays
  private pTerm: number[] = [];
  private pDoc: number[] = [];
  private pWeight: number[] = [];
  private offsets: Int32Array | null = null;
  /** All postings, grouped by term; a term's slice is given by span(). */
  docs = new Int32Array(0);
  weights = new Float32Array(0);

  /** Entries must be added in ascending order, so a repeat of the same entry is its term's last posting. */
  add(term: string, doc: number, weight: number) {
    let id = this.ids.get(term);
    if (id === undefined) {
      id = this.termList.length;
      this.ids.set(term, id);
      this.termList.push(term);
      this.lastDoc.push(-1);
      this.lastAt.push(-1);
    }
    if (this.lastDoc[id] === doc) {
      const at = this.lastAt[id];
      if (weight > this.pWeight[at]) this.pWeight[at] = weight;
      return;
    }
    this.lastDoc[id] = doc;
    this.lastAt[id] = this.pTerm.length;
    this.pTerm.push(id);
    this.pDoc.push(doc);
    this.pWeight.push(weight);
  }

  /** Groups the postings by term (a counting sort), keeping each term's entries in order. */
  finish(): this {
    const n = this.termList.length;
    const offsets = new Int32Array(n + 1);
    for (const t of this.pTerm) offsets[t + 1]++;
    for (let i = 0; i < n; i++) offsets[i + 1] += offsets[i];
    const fill = offsets.slice(0, n);
    this.docs = new Int32Array(this.pTerm.length);
    this.weights = new Float32Array(this.pTerm.length);
    for (let k = 0; k < this.pTerm.length; k++) {
      const at = fill[this.pTerm[k]]++;
      this.docs[at] = this.pDoc[k];
      this.weights[at] = this.pWeight[k];
    }
    this.offsets = offsets;
    this.pTerm = this.pDoc = this.pWeight = this.lastDoc = this.lastAt = [];
    return this;
  }

  /** Start and end of a term's slice of docs/weights (end 0 when unknown): no allocation per lookup. */
  span(term: string, out: Int32Array): boolean {
    const id = this.ids.get(term);
    if (id === undefined || !this.offsets) return false;
    out[0] = this.offsets[id];
    out[1] = this.offsets[id + 1];
    return true;
  }

  get(term: string): Postings | undefined {
    const id = this.ids.get(term);
    if (id === undefined || !this.offsets) return undefined;
    const [from, to] = [this.offsets[id], this.offsets[id + 1]];
    return { docs: this.docs.subarray(from, to), weights: this.weights.subarray(from, to) };
  }

  has(term: string): boolean {
    return this.ids.has(term);
  }

  get size(): number {
    return this.termList.length;
  }

  terms(): readonly string[] {
    return this.termList;
  }
}
