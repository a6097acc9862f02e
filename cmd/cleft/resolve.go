package main

import (
	"bufio"
	"io"

	"cleft/planes/site"
	"cleft/plots/table"

	"github.com/spf13/cobra"
)

type resolveOptions struct {
	site   string
	planes string
	format string
	out    string
	warn   io.Writer // standard error, for warnings
}

func newResolveCmd() *cobra.Command {
	var o resolveOptions
	c := &cobra.Command{
		Use:   "resolve SITE.yaml [--planes FILE.csv | --planes -] [--format csv|json] [--out FILE]",
		Short: "Stress, tendencies and factor of safety for every plane, one row each",
		Long: `resolve writes one row per input plane, in input order, streamed: the
pore pressure, normal, shear and effective normal stress, slip tendency (and
normalised), dilation tendency, factor of safety, pressure to slip, rake and
sense of slip, and the state (stable, critical, opening).

The planes are those of the site file (planes: and planes_file:) unless
--planes names a CSV table ("-" for standard input). Output goes to standard
output unless --out names a file, which is then written whole or not at all.

` + caution,
		Args: oneSite,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.site, o.warn = args[0], cmd.ErrOrStderr()
			return runResolve(o, cmd.InOrStdin(), cmd.OutOrStdout())
		},
	}
	c.Flags().StringVar(&o.planes, "planes", "", "planes table (CSV) replacing the site file's planes; - reads standard input")
	c.Flags().StringVar(&o.format, "format", "csv", "output format: csv or json")
	c.Flags().StringVar(&o.out, "out", "", "write the table to this file instead of standard output")
	return c
}

func runResolve(o resolveOptions, stdin io.Reader, stdout io.Writer) error {
	f, err := table.ParseFormat(o.format)
	if err != nil {
		return usageError{err}
	}
	outs := []string{o.out}
	if err := refuseInputs(outs, o.site, o.planes); err != nil {
		return err
	}
	s, err := site.Load(o.site)
	if err != nil {
		return err
	}
	if err := refuseInputs(outs, siteInputs(s)...); err != nil {
		return err
	}
	ps, err := s.OpenPlanes(o.planes, stdin)
	if err != nil {
		return err
	}
	defer ps.Close()
	if o.out != "" {
		err = writeFile(o.out, func(w io.Writer) error {
			_, err := streamTable(s, ps, f, w)
			return err
		})
	} else {
		bw := bufio.NewWriterSize(stdout, 1<<16)
		_, err = streamTable(s, ps, f, bw)
		if ferr := bw.Flush(); err == nil {
			err = ferr
		}
	}
	if err == nil {
		first, n, unchecked := ps.Repeats()
		warnRepeats(o.warn, first, n, unchecked)
	}
	return err
}
