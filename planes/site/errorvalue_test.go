package site

import (
	"errors"
	"fmt"
	"testing"
)

// kindNames names the kinds of mistake, for test messages.
var kindNames = map[error]string{
	ErrSyntax: "ErrSyntax", ErrUnknownKey: "ErrUnknownKey", ErrMissing: "ErrMissing",
	ErrType: "ErrType", ErrNotNumber: "ErrNotNumber", ErrRange: "ErrRange",
	ErrDuplicate: "ErrDuplicate", ErrConflict: "ErrConflict", ErrEmpty: "ErrEmpty",
	ErrNoPlanes: "ErrNoPlanes", ErrRead: "ErrRead", ErrInvalid: "ErrInvalid",
	ErrLimit: "ErrLimit", ErrEncoding: "ErrEncoding", nil: "nil",
}

// errorLiteral writes e as the Go literal a test would want.
func errorLiteral(e Error) string {
	kind, ok := kindNames[e.Err]
	if !ok {
		kind = fmt.Sprintf("%#v", e.Err)
	}
	return fmt.Sprintf("Error{File: %q, Line: %d, Column: %d, Key: %q, Err: %s, Msg: %q}", e.File, e.Line, e.Column, e.Key, kind, e.Msg)
}

// sameError fails the test unless err is a *Error of want's kind and equal
// to want in every field: the file, the line, the column, the key, the kind
// and the whole message.
func sameError(t *testing.T, err error, want Error) {
	t.Helper()
	var e *Error
	if !errors.As(err, &e) {
		t.Fatalf("error %v (%T) is not a *site.Error", err, err)
	}
	if !errors.Is(err, want.Unwrap()) {
		t.Errorf("error %q is not %s", err, kindNames[want.Unwrap()])
	}
	if *e != want {
		t.Errorf("error %q\ngot  %s\nwant %s", err, errorLiteral(*e), errorLiteral(want))
	}
}
