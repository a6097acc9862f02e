package main

import (
	"errors"
	"io"
	"runtime"
	"sync"

	"cleft/planes"
	"cleft/planes/site"
	"cleft/plots/table"
)

// batchSize is the number of planes read, resolved and written together;
// a batch also ends once its names and carried values pass batchBytes, so
// that long rows (up to site.MaxRow) cannot make the batches in flight large.
const (
	batchSize  = 2048
	batchBytes = 1 << 20
)

// batch is a run of planes on their way through the pipeline.
type batch struct {
	rows   []site.Row   // as read
	planes []site.Plane // as parsed by a worker
	n      int
	first  bool  // holds the first row of the table
	err    error // the error that ended the input after the first n rows
	out    []byte
	done   chan struct{}
}

// streamTable reads every plane of ps, resolves it and writes its row to w
// in input order. Reading runs in one goroutine, parsing, resolving and
// formatting in one per CPU, writing in the caller's; at most 2·workers + 1 batches are in
// flight, so memory stays flat however long the input. On a bad row the rows
// before it are written and its error returned.
func streamTable(s *site.Site, ps *site.PlaneStream, f table.Format, w io.Writer) (int, error) {
	names := table.Carried(table.Columns, ps.ExtraNames)
	workers := runtime.GOMAXPROCS(0)
	inflight := 2*workers + 1
	free := make(chan *batch, inflight)
	for range inflight {
		free <- &batch{rows: make([]site.Row, batchSize), planes: make([]site.Plane, batchSize)}
	}
	work := make(chan *batch, inflight)
	order := make(chan *batch, inflight)
	quit := make(chan struct{})

	go func() { // reader
		defer close(work)
		defer close(order)
		first := true
		for {
			var b *batch
			select {
			case b = <-free:
			case <-quit:
				return
			}
			b.n, b.err, b.first, b.out = 0, nil, first, b.out[:0]
			b.done = make(chan struct{})
			first = false
			size, end := 0, false
			for b.n < batchSize && size < batchBytes {
				r := &b.rows[b.n]
				if err := ps.NextRow(r); err != nil {
					if !errors.Is(err, io.EOF) {
						b.err = err
					}
					end = true
					break
				}
				b.n++
				size += r.Size()
			}
			order <- b
			work <- b
			if end {
				return
			}
		}
	}()

	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			rv := s.Resolver()
			var r planes.Result
			for b := range work {
				for i := range b.n {
					p := &b.planes[i]
					if err := ps.Parse(&b.rows[i], p); err != nil {
						b.n, b.err = i, err // the rows before it are written
						break
					}
					rv.Resolve(p, &r)
					b.out = table.AppendRow(b.out, f, p, &r, names, b.first && i == 0)
				}
				close(b.done)
			}
		}()
	}

	rows := 0
	var err error
	if _, err = w.Write(table.Header(f, names)); err == nil {
		for b := range order {
			<-b.done
			if _, err = w.Write(b.out); err != nil {
				break
			}
			rows += b.n
			if b.err != nil {
				err = b.err
				break
			}
			free <- b
		}
	}
	if err == nil {
		_, err = w.Write(table.Footer(f, rows))
	}
	close(quit)
	for range order { // let the reader finish
	}
	wg.Wait()
	return rows, err
}
