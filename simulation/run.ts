// The one place simulation/ reaches the ngspice runner. It still lives under
// tests/spice/ while another branch moves it here; repoint this re-export then.
export { NgspiceError, runNgspice, sp, valueOf, type NgspiceResult } from "../tests/spice/ngspice";
