package sim

import "math/rand/v2"

// randRand is the generator type used by the samplers.
type randRand = rand.Rand

// splitmix64 is the output function of Steele, Lea and Flood (2014),
// "Fast splittable pseudorandom number generators", OOPSLA: a bijective
// mixer used to derive independent seeds.
func splitmix64(x uint64) uint64 {
	x += 0x9e3779b97f4a7c15
	x = (x ^ (x >> 30)) * 0xbf58476d1ce4e5b9
	x = (x ^ (x >> 27)) * 0x94d049bb133111eb
	return x ^ (x >> 31)
}

// Stream identifiers keep the random streams of different uses apart.
const (
	streamMC uint64 = iota + 1
	streamLHS
	streamQMC
	streamAux
)

// blockSeed returns the two PCG seed words of block b of the given stream.
func blockSeed(seed, stream, b uint64) (uint64, uint64) {
	s := splitmix64(seed ^ splitmix64(stream<<56^b))
	return s, splitmix64(s ^ 0x5851f42d4c957f2d)
}

// blockRNG is a reseedable generator; reseeding does not allocate. The
// generator state, written at every draw, is padded so that the
// generators of two workers never share a cache line.
type blockRNG struct {
	_   [64]byte
	pcg rand.PCG
	_   [64]byte
	r   *rand.Rand
}

func newBlockRNG() *blockRNG {
	g := &blockRNG{}
	g.r = rand.New(&g.pcg)
	return g
}

func (g *blockRNG) seed(seed, stream, b uint64) {
	g.pcg.Seed(blockSeed(seed, stream, b))
}
