package analysis

// Where the joint sample stops. It is looked at after 1, 2, 4, 8 and 16
// blocks, then after every systemBatch blocks more (batches of 1, 1, 2,
// 4, 8, 16, 16, ... blocks): a system resolved after a few hundred
// samples stops after one block, one that is not draws at most a batch
// past its stop. The looks depend on the blocks alone, so a single run of
// any worker count and a merge of shards stop at the same block.

// minSystemFailures is the fewest failing samples the joint sample stops
// at on its coefficient of variation: the status "few failures" is then
// never the outcome of a stop, only of the budget.
const minSystemFailures = 100

// nextLook returns the number of blocks drawn at the look after the one
// at b blocks (0 before the first).
func nextLook(b int) int {
	if b < systemBatch {
		return max(1, 2*b)
	}
	return b + systemBatch
}

// resolved reports whether the joint sample's counts c are enough to stop
// at: the system's pf has a coefficient of variation of at most
// targetCoV from at least minSystemFailures failing samples, and the
// largest member's share of the system failure, k/F (k the samples in
// which it failed, F the failing samples), has one of at most targetCoV,
// sqrt((1 - k/F) / k) given F, or at least systemBatch blocks are drawn
// (the shares are then as precise as that many samples make them: a
// system whose failures spread over many members, each with a small
// share, would otherwise run to its budget for shares that rank nothing).
func resolved(c *systemCounts, targetCoV float64, blocks int) bool {
	if !(targetCoV > 0) || c.failures < minSystemFailures || c.cov() > targetCoV {
		return false
	}
	if blocks >= systemBatch {
		return true
	}
	k := int64(0)
	for _, m := range c.members {
		k = max(k, m)
	}
	s := float64(k) / float64(c.failures)
	return (1-s)/float64(k) <= targetCoV*targetCoV
}
