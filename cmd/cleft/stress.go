package main

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"cleft/insitu"
	"cleft/planes/site"

	"github.com/spf13/cobra"
)

type stressOptions struct {
	site   string
	depths []float64
	format string
}

func newStressCmd() *cobra.Command {
	var o stressOptions
	c := &cobra.Command{
		Use:   "stress SITE.yaml --depth Z [--depth Z …] [--format text|json]",
		Short: "The far-field stress state at chosen depths",
		Long: `stress prints the stress state of the site's model at each depth: the
tensor (NED, compression positive, MPa), the principal stresses with the
trend and plunge of their axes, the pore pressure, the stress regime
(Anderson 1951), the shape ratio φ and Aφ (Simpson 1997), and the effective
principal stress ratio against the frictional limit [√(μ²+1)+μ]² (Jaeger &
Cook 1979; Zoback 2007). Without --depth it uses the site's report.depths or
depth.

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site = args[0]
			return runStress(o, cmd.OutOrStdout())
		},
	}
	floatsVar(c.Flags(), &o.depths, "depth", "depth below ground, m (repeat or comma-separate for several)")
	c.Flags().StringVar(&o.format, "format", "text", "output format: text or json")
	return c
}

func runStress(o stressOptions, stdout io.Writer) error {
	if o.format != "text" && o.format != "json" {
		return usagef("--format %q: want text or json", o.format)
	}
	for _, z := range o.depths {
		if err := inRange("depth", z, 0, site.MaxDepth, " m below ground"); err != nil {
			return err
		}
	}
	s, err := site.Load(o.site)
	if err != nil {
		return err
	}
	depths := o.depths
	if len(depths) == 0 {
		depths = s.ReportDepths
	}
	if len(depths) == 0 && s.HasDepth {
		depths = []float64{s.Depth}
	}
	if len(depths) == 0 {
		return usagef("give --depth Z (m): the site file has no report.depths or depth")
	}
	doc := newStressDoc(s, depths)
	if o.format == "json" {
		return writeJSON(stdout, doc)
	}
	var b strings.Builder
	fmt.Fprintf(&b, "%s — %s\n", s.Name, s.Summary())
	for _, n := range s.Notes {
		fmt.Fprintf(&b, "note: %s\n", n)
	}
	for _, r := range doc.States {
		b.WriteByte('\n')
		r.text(&b)
	}
	fmt.Fprintf(&b, "\n%s\n", caution)
	_, err = io.WriteString(stdout, b.String())
	return err
}

// stressDoc is the JSON form of cleft stress and of stress.json.
type stressDoc struct {
	Site   string      `json:"site"`
	Model  string      `json:"model"`
	Notes  []string    `json:"notes,omitempty"`
	States []stressRow `json:"states"`
}

// newStressDoc is the stress state of s at each depth.
func newStressDoc(s *site.Site, depths []float64) stressDoc {
	d := stressDoc{Site: s.Name, Model: s.Summary(), Notes: s.Notes, States: make([]stressRow, len(depths))}
	for i, z := range depths {
		d.States[i] = stressAt(s, z)
	}
	return d
}

// stressRow is the stress state at one depth as cleft reports it.
type stressRow struct {
	Depth        num           `json:"depth_m"`
	Tensor       tensorJSON    `json:"tensor_mpa"`
	Principal    [3]principalJ `json:"principal"`
	PorePressure num           `json:"pore_pressure_mpa"`
	Biot         num           `json:"biot"`
	Regime       string        `json:"regime"`
	VerticalAxis string        `json:"vertical_axis"`
	AxisTilt     num           `json:"vertical_axis_tilt_deg"`
	Andersonian  bool          `json:"andersonian"`
	Shape        num           `json:"shape_ratio"`
	APhi         num           `json:"a_phi"`
	Ratio        num           `json:"effective_ratio"`
	Friction     num           `json:"friction"`
	Limit        num           `json:"frictional_limit"`
	Exceeds      bool          `json:"exceeds_frictional_limit"`
}

type tensorJSON struct {
	NN num `json:"nn"`
	EE num `json:"ee"`
	DD num `json:"dd"`
	NE num `json:"ne"`
	ND num `json:"nd"`
	ED num `json:"ed"`
}

type principalJ struct {
	Magnitude num `json:"magnitude_mpa"`
	Effective num `json:"effective_mpa"`
	Trend     num `json:"trend_deg"`
	Plunge    num `json:"plunge_deg"`
}

// num is a float64 that is JSON null when NaN or infinite.
type num float64

func (n num) MarshalJSON() ([]byte, error) {
	f := float64(n)
	if math.IsNaN(f) || math.IsInf(f, 0) {
		return []byte("null"), nil
	}
	return strconv.AppendFloat(nil, f+0, 'g', 10, 64), nil
}

var axisNames = [3]string{"σ1", "σ2", "σ3"}

func stressAt(s *site.Site, z float64) stressRow {
	st := s.Model.At(z)
	p := st.Principal
	eff := st.EffectivePrincipal()
	fit := p.Regime()
	phi := p.Shape()
	lc := insitu.CheckLimit(st, s.Criterion.Friction())
	r := stressRow{
		Depth:        num(z),
		Tensor:       tensorJSON{num(st.Total.NN), num(st.Total.EE), num(st.Total.DD), num(st.Total.NE), num(st.Total.ND), num(st.Total.ED)},
		PorePressure: num(st.PorePressure),
		Biot:         num(st.Biot),
		Regime:       fit.Regime.String(),
		VerticalAxis: axisNames[fit.Axis],
		AxisTilt:     num(fit.Tilt),
		Andersonian:  fit.Andersonian(),
		Shape:        num(phi),
		APhi:         num(insitu.APhi(fit.Regime, phi)),
		Ratio:        num(lc.Ratio),
		Friction:     num(lc.Friction),
		Limit:        num(lc.Limit),
		Exceeds:      lc.Exceeds,
	}
	if p.Isotropic() {
		r.Regime, r.VerticalAxis, r.AxisTilt, r.Andersonian = "isotropic", "", num(math.NaN()), false
	}
	for i := range 3 {
		a := p.Axis(i)
		r.Principal[i] = principalJ{num(p.Values[i]), num(eff[i]), num(a.Trend), num(a.Plunge)}
	}
	return r
}

func (r stressRow) text(b *strings.Builder) {
	fmt.Fprintf(b, "Depth %s m\n", fmtG(float64(r.Depth)))
	t := r.Tensor
	fmt.Fprintf(b, "  tensor, MPa (NED, compression +): σNN %s  σEE %s  σDD %s  σNE %s  σND %s  σED %s\n",
		fmtF(t.NN), fmtF(t.EE), fmtF(t.DD), fmtF(t.NE), fmtF(t.ND), fmtF(t.ED))
	fmt.Fprintf(b, "  %-4s %10s %12s %7s %7s\n", "", "total MPa", "effective", "trend", "plunge")
	for i, p := range r.Principal {
		fmt.Fprintf(b, "  %-4s %10s %12s %7s %7s\n", axisNames[i], fmtF(p.Magnitude), fmtF(p.Effective), fmtA(p.Trend, "%05.1f"), fmtA(p.Plunge, "%.1f"))
	}
	fmt.Fprintf(b, "  pore pressure %s MPa (Biot α = %s)\n", fmtF(r.PorePressure), fmtG(float64(r.Biot)))
	switch {
	case r.Regime == "isotropic":
		b.WriteString("  regime: none (isotropic state)\n")
	case r.Andersonian:
		fmt.Fprintf(b, "  regime: %s (%s vertical), φ = %s, Aφ = %s\n", r.Regime, r.VerticalAxis, fmtR(r.Shape), fmtR(r.APhi))
	default:
		fmt.Fprintf(b, "  regime: not Andersonian; nearest is %s (%s axis %.1f° from vertical), φ = %s, Aφ = %s\n", r.Regime, r.VerticalAxis, float64(r.AxisTilt), fmtR(r.Shape), fmtR(r.APhi))
	}
	ratio := fmt.Sprintf("%.3f", float64(r.Ratio))
	switch f := float64(r.Ratio); {
	case math.IsNaN(f):
		ratio = "undefined (no stress)"
	case math.IsInf(f, 0):
		ratio = "∞ (σ3' ≤ 0)"
	}
	verdict := "within the limit"
	if math.IsNaN(float64(r.Ratio)) {
		verdict = "the check does not apply"
	}
	if r.Exceeds {
		verdict = "EXCEEDS the limit: such a state would already have slipped on optimally oriented planes; check the stress estimate"
	}
	fmt.Fprintf(b, "  frictional limit: (σ1−αPp)/(σ3−αPp) = %s against %.3f for μ = %s — %s\n", ratio, float64(r.Limit), strconv.FormatFloat(float64(r.Friction), 'g', 4, 64), verdict)
}

func fmtF(n num) string { return fmt.Sprintf("%.4f", float64(n)+0) }

func fmtR(n num) string {
	if math.IsNaN(float64(n)) {
		return "undefined"
	}
	return fmt.Sprintf("%.3f", float64(n))
}

func fmtA(n num, format string) string {
	if math.IsNaN(float64(n)) {
		return "—"
	}
	return fmt.Sprintf(format, float64(n))
}

func fmtG(f float64) string { return fmt.Sprintf("%g", f) }

func writeJSON(w io.Writer, v any) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	return enc.Encode(v)
}
