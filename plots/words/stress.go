package words

import (
	"fmt"

	"cleft/insitu"
)

// Regime names the stress regime of p with φ and Aφ, or says it is not
// Andersonian (naming the nearest regime and the tilt of its vertical
// axis), or isotropic.
func Regime(p insitu.Principal) string {
	if p.Isotropic() {
		return "isotropic (no regime)"
	}
	f := p.Regime()
	phi := p.Shape()
	if !f.Andersonian() {
		return fmt.Sprintf("not Andersonian: nearest %s (σ%d axis %.1f° from vertical); φ = %.2f", f.Regime, f.Axis+1, f.Tilt, phi)
	}
	return fmt.Sprintf("%s, φ = %.2f, Aφ = %.2f", f.Regime, phi, insitu.APhi(f.Regime, phi))
}
