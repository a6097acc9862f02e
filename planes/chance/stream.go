package chance

import (
	"encoding/binary"
	"math/rand/v2"
)

// Purposes of the random streams, so that the streams of Draw and those of
// the realisations never share a key.
const (
	purposeRealisation uint64 = iota
	purposeInput
	purposeScores
	purposeItem
)

// StreamKey returns the ChaCha8 key of the random stream of one realisation
// for the given seed: the seed, a purpose tag and the realisation index,
// little-endian, in the first 24 bytes. Distinct (seed, realisation) give
// distinct keys and so independent streams. A worker may keep one
// rand.ChaCha8 and reseed it per realisation with this key, without
// allocating. StreamKey panics if realisation is negative.
func StreamKey(seed uint64, realisation int) [32]byte {
	if realisation < 0 {
		panic("chance: negative realisation")
	}
	return key(seed, purposeRealisation, uint64(realisation))
}

// Stream returns a new generator for one realisation, seeded by
// StreamKey(seed, realisation). Draws made inside parallel workers from
// their realisation's stream do not depend on the number of workers or the
// order in which realisations run.
func Stream(seed uint64, realisation int) *rand.Rand {
	return rand.New(rand.NewChaCha8(StreamKey(seed, realisation)))
}

// ItemStream returns a new generator for one item (a plane, say) whose draws
// are taken in realisation order by the one goroutine that handles the
// item: the ChaCha8 stream keyed by (seed, an item tag, item). Its keys
// never equal those of Stream or of Draw's inputs. ItemStream panics if item
// is negative.
func ItemStream(seed uint64, item int) *rand.Rand {
	if item < 0 {
		panic("chance: negative item")
	}
	return rand.New(rand.NewChaCha8(key(seed, purposeItem, uint64(item))))
}

func key(seed, purpose, index uint64) [32]byte {
	var k [32]byte
	binary.LittleEndian.PutUint64(k[0:], seed)
	binary.LittleEndian.PutUint64(k[8:], purpose)
	binary.LittleEndian.PutUint64(k[16:], index)
	return k
}

// openUniform returns a uniform variate on the open interval (0, 1): the
// midpoints of 2⁵³ equal cells, so that an inverse CDF never sees 0 or 1.
func openUniform(src rand.Source) float64 {
	return (float64(src.Uint64()>>11) + 0.5) / (1 << 53)
}
