package main

import (
	"bufio"
	"bytes"
	"fmt"
	"os"
	"runtime"
	"strconv"
	"sync"
)

const floorHeader = "name,dip,dip_direction,depth_m,pore_pressure_mpa,normal_stress_mpa,shear_stress_mpa,effective_normal_stress_mpa,slip_tendency,slip_tendency_normalised,dilation_tendency,factor_of_safety,pressure_to_slip_mpa,rake_deg,slip_sense,state,set\n"

// floor is the read-and-write floor of cleft resolve: it reads the same
// planes CSV (name, dip, dip_direction, depth, set) and writes a table of
// the same shape as cleft resolve's (name, 13 floats with 8 significant
// digits by strconv, two words, set), computing nothing but a made-up value
// from the three numbers of each row. Like cleft it splits the input in
// batches of 2048 rows, parses and formats them in one goroutine per CPU and
// writes them in order. The benchmark runs it as a child process (the
// benchmark binary with -floor IN,OUT), so that it is timed as cleft is.
func floor(in, out string) error {
	data, err := os.ReadFile(in)
	if err != nil {
		return err
	}
	if i := bytes.IndexByte(data, '\n'); i >= 0 {
		data = data[i+1:] // the header
	}
	var chunks [][]byte
	for len(data) > 0 {
		end, n := 0, 0
		for n < 2048 && end < len(data) {
			i := bytes.IndexByte(data[end:], '\n')
			if i < 0 {
				end = len(data)
			} else {
				end += i + 1
			}
			n++
		}
		chunks = append(chunks, data[:end])
		data = data[end:]
	}
	outs := make([][]byte, len(chunks))
	errs := make([]error, len(chunks))
	done := make([]chan struct{}, len(chunks))
	next := make(chan int, len(chunks))
	for i := range chunks {
		done[i] = make(chan struct{})
		next <- i
	}
	close(next)
	var wg sync.WaitGroup
	for range runtime.GOMAXPROCS(0) {
		wg.Go(func() {
			for i := range next {
				outs[i], errs[i] = floorRows(chunks[i])
				close(done[i])
			}
		})
	}
	f, err := os.Create(out)
	if err != nil {
		return err
	}
	w := bufio.NewWriterSize(f, 1<<16)
	w.WriteString(floorHeader)
	for i := range chunks {
		<-done[i]
		if errs[i] != nil {
			return fmt.Errorf("%s: %w", in, errs[i])
		}
		w.Write(outs[i])
		outs[i] = nil
	}
	wg.Wait()
	if err := w.Flush(); err != nil {
		return err
	}
	return f.Close()
}

// floorRows parses and formats the rows of one batch.
func floorRows(data []byte) ([]byte, error) {
	buf := make([]byte, 0, 180*2048)
	var field [5][]byte
	for len(data) > 0 {
		line := data
		if i := bytes.IndexByte(data, '\n'); i >= 0 {
			line, data = data[:i], data[i+1:]
		} else {
			data = nil
		}
		for k := range field {
			i := bytes.IndexByte(line, ',')
			if i < 0 {
				i = len(line)
			}
			field[k], line = line[:i], line[min(i+1, len(line)):]
		}
		var v [3]float64
		for k := range v {
			var err error
			if v[k], err = strconv.ParseFloat(string(field[k+1]), 64); err != nil {
				return nil, err
			}
		}
		buf = append(buf, field[0]...)
		x := v[0]/91 + v[1]/361 + v[2]/1009 + 0.1234567891
		for k := range 13 {
			buf = append(buf, ',')
			buf = strconv.AppendFloat(buf, x*float64(k+1)*1.7320508, 'g', 8, 64)
		}
		buf = append(buf, ",reverse,stable,"...)
		buf = append(buf, field[4]...)
		buf = append(buf, '\n')
	}
	return buf, nil
}
