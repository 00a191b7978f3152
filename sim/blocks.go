package sim

// blockSize is the number of samples in one block of the sample index
// space. Block b holds the samples b*blockSize .. (b+1)*blockSize-1 and is
// drawn from its own generator seeded from (seed, b); the results of blocks
// are combined in block order, which makes a run independent of the number
// of workers.
const blockSize = 8192

// numBlocks returns the number of blocks covering n samples.
func numBlocks(n int64) int { return int((n + blockSize - 1) / blockSize) }

// blockRange returns the first sample index and the size of block b.
func blockRange(b int, n int64) (start int64, size int) {
	start = int64(b) * blockSize
	end := min(start+blockSize, n)
	return start, int(end - start)
}
