package chance

import (
	"errors"
	"fmt"
)

// Errors returned for bad data. Constructors and Draw wrap them with the
// offending values; test for them with errors.Is.
var (
	ErrNotFinite    = errors.New("parameter not finite")
	ErrSpread       = errors.New("negative spread")
	ErrOrder        = errors.New("low above high")
	ErrMode         = errors.New("mode outside [low, high]")
	ErrMedian       = errors.New("lognormal median not positive")
	ErrBounds       = errors.New("truncation min not below max")
	ErrEmpty        = errors.New("truncation leaves no probability")
	ErrIndex        = errors.New("correlation input index out of range")
	ErrSelf         = errors.New("input correlated with itself")
	ErrDuplicate    = errors.New("pair correlated twice")
	ErrRho          = errors.New("rank correlation not in (−1, 1)")
	ErrNotPosDef    = errors.New("correlation matrix not positive definite")
	ErrNoScores     = errors.New("rank correlations not reachable by normal scores (2·sin(πρ/6) matrix not positive definite)")
	ErrRealisations = errors.New("too few realisations for the correlated inputs")
)

// CorrelationError reports a bad entry of the correlation list given to
// Draw. Pair is the 0-based position of the entry in the list; A and B are
// its input indices, Rho its value, and Err one of ErrIndex, ErrSelf,
// ErrDuplicate, ErrRho, ErrNotPosDef or ErrNoScores.
//
// For ErrNotPosDef the pairs are added to the identity one at a time in list
// order and Pair is the first one whose addition leaves the matrix not
// positive definite: the entry that conflicts with those before it.
// ErrNoScores is the same test on the matrix of 2·sin(π·ρ/6), the normal-
// score correlations Draw uses (see Draw); a few valid rank-correlation
// matrices near the edge of positive definiteness fail it.
type CorrelationError struct {
	Pair int
	A, B int
	Rho  float64
	Err  error
}

func (e *CorrelationError) Error() string {
	return fmt.Sprintf("%v: pair %d (inputs %d and %d, rho %g)", e.Err, e.Pair, e.A, e.B, e.Rho)
}

func (e *CorrelationError) Unwrap() error { return e.Err }
