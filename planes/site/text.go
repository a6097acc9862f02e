package site

import (
	"fmt"
	"unicode/utf8"
)

// badText returns the byte offset in s of the first invalid UTF-8 sequence
// or control character (C0, DEL, C1), or −1 when there is none. With breaks,
// tab, line feed and carriage return are allowed (free text such as a note);
// without, they are not (names, which label figures).
func badText(s string, breaks bool) int {
	for i := 0; i < len(s); {
		c := s[i]
		if c >= 0x20 && c < 0x7f {
			i++
			continue
		}
		if c < 0x80 {
			if breaks && (c == '\t' || c == '\n' || c == '\r') {
				i++
				continue
			}
			return i
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if (r == utf8.RuneError && size == 1) || isControl(r) {
			return i
		}
		i += size
	}
	return -1
}

// textProblem describes the fault badText found at offset i of s.
func textProblem(s string, i int) string {
	r, size := utf8.DecodeRuneInString(s[i:])
	if r == utf8.RuneError && size == 1 {
		return fmt.Sprintf("byte 0x%02X at character %d is not UTF-8: save the file as UTF-8 text", s[i], utf8.RuneCountInString(s[:i])+1)
	}
	return fmt.Sprintf("control character %U at character %d: remove it", r, utf8.RuneCountInString(s[:i])+1)
}
