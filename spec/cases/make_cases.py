"""Writes the conformance cases of spec/cases: valid studies and invalid ones.

The studies are invented, built to cover every key of study format 1 and every device type.
Expected outputs are not written here: the conformance test in coordination-plot writes them
when run with -Dcorpus.regenerate=true, and checks every cable check of a valid case against an
independent dense-sampling computation of the same models.

    python3 make_cases.py
"""
import os

HEAD = """format: 1
title: {title}
voltage_kv: {kv}
"""

def write(folder, name, text):
    with open(os.path.join(folder, name + ".yaml"), "w", encoding="utf-8", newline="\n") as f:
        f.write(text)

RELAY = """  - id: R1
    type: relay
    breaker_s: 0.05
    stages:
      - {curve: iec-standard-inverse, pickup_a: 250, tms: 0.2}
      - {curve: definite-time, pickup_a: 3000, delay_s: 0.1}
      - {curve: instantaneous, pickup_a: 10000}
"""
CABLE = """  - id: C1
    conductor: copper
    insulation: xlpe
    size_mm2: 70
    fault_ka: {min: 1.5, max: 12}
"""
BASE = HEAD.format(title="Conformance base", kv=0.4) + "cables:\n" + CABLE + "devices:\n" + RELAY + \
    "checks:\n  - {cable: C1, device: R1, margin_s: 0.1}\n"

valid = {}
for fam, key, m in [("iec-standard-inverse", "tms", 0.1), ("iec-very-inverse", "tms", 0.3),
                    ("iec-extremely-inverse", "tms", 0.5), ("iec-long-time-inverse", "tms", 0.1),
                    ("ieee-moderately-inverse", "time_dial", 1.5), ("ieee-very-inverse", "time_dial", 2),
                    ("ieee-extremely-inverse", "time_dial", 3)]:
    valid["relay-" + fam] = (HEAD.format(title="Relay " + fam, kv=0.4) + "cables:\n" + CABLE
        + "devices:\n  - id: R1\n    type: relay\n    stages:\n      - {curve: " + fam + ", pickup_a: 300, "
        + key + ": " + str(m) + "}\nchecks:\n  - {cable: C1, device: R1}\n")
valid["relay-hold-above-20x"] = BASE.replace("tms: 0.2}", "tms: 0.2, high_current: hold, upper_multiple: 20}")
valid["relay-custom-curve-ct"] = (HEAD.format(title="Custom curve behind a CT", kv=0.4) + "cables:\n" + CABLE
    + "devices:\n  - id: R1\n    type: relay\n    breaker_s: 0.06\n    ct: {primary_a: 400, secondary_a: 1}\n"
    + "    stages:\n      - {curve: custom, pickup_a: 0.8, a_s: 10, b_s: 0.05, p: 1.5, tms: 0.4, reset_s: 5}\n"
    + "checks:\n  - {cable: C1, device: R1, margin_ratio: 1.5}\n")
valid["definite-time-crossing"] = (HEAD.format(title="Definite time crossing the damage curve", kv=0.4)
    + "cables:\n  - {id: C1, conductor: copper, insulation: xlpe, size_mm2: 35, fault_ka: {min: 1.5, max: 12}}\n"
    + "devices:\n  - id: R1\n    type: relay\n    breaker_s: 0.05\n    stages:\n"
    + "      - {curve: definite-time, pickup_a: 1000, delay_s: 0.5}\nchecks:\n  - {cable: C1, device: R1, margin_s: 0.1}\n")
valid["below-pickup-not-cleared"] = BASE.replace("fault_ka: {min: 1.5, max: 12}", "fault_ka: {min: 0.2, max: 12}")
valid["fuse-with-i2t"] = (HEAD.format(title="Fuse with stated let-through", kv=0.4)
    + "cables:\n  - {id: C1, conductor: aluminium, insulation: pvc, size_mm2: 95, fault_ka: {min: 1, max: 20}}\n"
    + "devices:\n  - id: F1\n    type: fuse\n    rating_a: 160\n"
    + "    melting: [[320, 1500], [500, 60], [800, 5], [1250, 0.5], [2000, 0.05], [3500, 0.008]]\n"
    + "    clearing: [[320, 1800], [500, 75], [800, 6.5], [1250, 0.65], [2000, 0.07], [3500, 0.012]]\n"
    + "    clearing_i2t_a2s: 150000\nchecks:\n  - {cable: C1, device: F1, margin_ratio: 1.2}\n")
valid["fuse-fuse-ratio"] = (HEAD.format(title="Fuse pair by rating ratio", kv=0.4) + "devices:\n"
    + "  - id: FU\n    type: fuse\n    rating_a: 315\n"
    + "    melting:  [[630, 2000], [1000, 100], [1600, 8], [2500, 0.8], [4000, 0.09], [7000, 0.01]]\n"
    + "    clearing: [[630, 2400], [1000, 130], [1600, 10], [2500, 1.0], [4000, 0.12], [7000, 0.016]]\n"
    + "  - id: FD\n    type: fuse\n    rating_a: 160\n"
    + "    melting: [[320, 1500], [500, 60], [800, 5], [1250, 0.5], [2000, 0.05], [3500, 0.008]]\n"
    + "    clearing: [[320, 1800], [500, 75], [800, 6.5], [1250, 0.65], [2000, 0.07], [3500, 0.012]]\n"
    + "checks:\n  - {upstream: FU, downstream: FD, rating_ratio: 1.6, range_ka: {min: 0.8, max: 3.5}}\n")
valid["breaker-trip-unit"] = (HEAD.format(title="Breaker with short-time ramp", kv=0.4)
    + "cables:\n  - {id: C1, conductor: copper, insulation: epr, size_mm2: 150, parallel: 2, fault_ka: {min: 3, max: 30}}\n"
    + "devices:\n  - id: Q1\n    type: breaker\n    ir_a: 630\n    tr_s: 10\n    isd_a: 4000\n    tsd_s: 0.2\n"
    + "    tsd_i2t: true\n    ii_a: 12000\n    pickup_tolerance: 0.1\n    time_tolerance: 0.15\n"
    + "    long_time_band: [1.05, 1.2]\n    instantaneous_s: [0.01, 0.04]\n"
    + "checks:\n  - {cable: C1, device: Q1, margin_s: 0.05}\n")
valid["mcb-types"] = (HEAD.format(title="Miniature breakers B, C and D", kv=0.23)
    + "cables:\n"
    + "  - {id: CB, conductor: copper, insulation: pvc, size_mm2: 2.5, fault_ka: {min: 0.3, max: 2}}\n"
    + "  - {id: CC, conductor: copper, insulation: pvc-90, size_mm2: 6, fault_ka: {min: 0.4, max: 3}}\n"
    + "  - {id: CD, conductor: copper, insulation: rubber-60, size_mm2: 16, fault_ka: {min: 1, max: 4}}\n"
    + "devices:\n  - {id: MB, type: mcb, curve_type: B, rating_a: 16, let_through_i2t_a2s: 15000}\n"
    + "  - {id: MC, type: mcb, curve_type: C, rating_a: 32, let_through_i2t_a2s: 40000, fastest_s: 0.004}\n"
    + "  - {id: MD, type: mcb, curve_type: D, rating_a: 63}\n"
    + "checks:\n  - {cable: CB, device: MB}\n  - {cable: CC, device: MC}\n  - {cable: CD, device: MD}\n")
valid["cable-kcmil-icea"] = (HEAD.format(title="Circular-mil cable, ICEA", kv=0.48)
    + "frequency_hz: 60\npage: letter\n"
    + "cables:\n  - {id: C1, conductor: copper, insulation: xlpe, size: \"500 kcmil\", method: icea, fault_ka: {min: 5, max: 40}}\n"
    + "devices:\n" + RELAY + "checks:\n  - {cable: C1, device: R1, margin_s: 0.1, dc_offset: {kappa: 1.9}}\n")
valid["cable-awg-aluminium"] = (HEAD.format(title="AWG aluminium cable", kv=0.48)
    + "cables:\n  - {id: C1, conductor: aluminum, insulation: xlpe, size: \"4/0 AWG\", fault_ka: {min: 2, max: 15}}\n"
    + "devices:\n" + RELAY + "checks:\n  - {cable: C1, device: R1}\n")
valid["cable-non-adiabatic-load"] = (HEAD.format(title="Non-adiabatic limit from load temperature", kv=0.4)
    + "revision: C\ndate: 2026-01-15\n"
    + "cables:\n  - id: C1\n    conductor: copper\n    insulation: paper\n    size_mm2: 240\n    method: non-adiabatic\n"
    + "    load: {current_a: 300, rated_a: 400, ambient_c: 25}\n    final_c: 160\n    fault_ka: {min: 1, max: 25}\n"
    + "devices:\n  - id: R1\n    type: relay\n    stages:\n      - {curve: iec-long-time-inverse, pickup_a: 500, tms: 0.2}\n"
    + "checks:\n  - {cable: C1, device: R1, range_ka: {min: 0.8, max: 20}}\n")
valid["pvc-large-section"] = (HEAD.format(title="PVC above 300 mm2", kv=0.4)
    + "cables:\n  - {id: C1, conductor: copper, insulation: pvc, size_mm2: 400, initial_c: 65, fault_ka: {min: 5, max: 40}}\n"
    + "devices:\n" + RELAY + "checks:\n  - {cable: C1, device: R1, margin_s: 0.2}\n")
valid["mineral-cables"] = (HEAD.format(title="Mineral insulated cables", kv=0.4)
    + "cables:\n  - {id: C1, conductor: copper, insulation: mineral-pvc, size_mm2: 10, fault_ka: {min: 0.5, max: 3}}\n"
    + "  - {id: C2, conductor: copper, insulation: mineral-bare, size_mm2: 10, fault_ka: {min: 0.5, max: 3}}\n"
    + "devices:\n  - {id: M1, type: mcb, curve_type: B, rating_a: 20, let_through_i2t_a2s: 20000}\n"
    + "checks:\n  - {cable: C1, device: M1}\n  - {cable: C2, device: M1}\n")
valid["voltage-base-transformer"] = (HEAD.format(title="Primary relay on the secondary base", kv=0.4)
    + "cables:\n  - {id: C1, conductor: copper, insulation: xlpe, size_mm2: 240, parallel: 3, fault_ka: {min: 5, max: 30}}\n"
    + "devices:\n  - id: HV\n    type: relay\n    voltage_kv: 11\n    breaker_s: 0.07\n    stages:\n"
    + "      - {curve: iec-standard-inverse, pickup_a: 60, tms: 0.15}\n      - {curve: instantaneous, pickup_a: 900, delay_s: 0.02}\n"
    + "  - id: LV\n    type: breaker\n    ir_a: 1600\n    tr_s: 8\n    isd_a: 8000\n    tsd_s: 0.2\n"
    + "checks:\n  - {cable: C1, device: HV}\n  - {upstream: HV, downstream: LV, interval_s: 0.2, range_ka: {min: 5, max: 20}}\n")
valid["grading-relays-interval"] = BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    breaker_s: 0.05\n    stages:\n"
    "      - {curve: iec-standard-inverse, pickup_a: 600, tms: 0.35}\n      - {curve: definite-time, pickup_a: 8000, delay_s: 0.5}\n"
    "checks:\n") + "  - {upstream: R0, downstream: R1, interval_s: 0.3, range_ka: {min: 1.5, max: 12}}\n"
valid["grading-breakers-no-overlap"] = (HEAD.format(title="Breakers without overlap", kv=0.4) + "devices:\n"
    + "  - {id: QU, type: breaker, ir_a: 1250, tr_s: 12, isd_a: 6000, tsd_s: 0.3}\n"
    + "  - {id: QD, type: breaker, ir_a: 250, tr_s: 5, isd_a: 1500, tsd_s: 0.05, ii_a: 3000}\n"
    + "checks:\n  - {upstream: QU, downstream: QD, no_overlap: true, range_ka: {min: 1, max: 5}}\n")
valid["relay-custom-time-dial"] = (HEAD.format(title="Custom curve set by time dial", kv=0.4) + "cables:\n" + CABLE
    + "devices:\n  - id: R1\n    type: relay\n    breaker_s: 0.05\n    stages:\n"
    + "      - {curve: custom, pickup_a: 300, a_s: 19.61, b_s: 0.491, p: 2, time_dial: 5, time_dial_range: [0.5, 15]}\n"
    + "      - {curve: definite-time, pickup_a: 3000, delay_s: 0.1}\n"
    + "checks:\n  - {cable: C1, device: R1, margin_s: 0.1}\n")
valid["cable-awg-zeros"] = (HEAD.format(title="AWG sizes written with zeros", kv=0.48)
    + "cables:\n  - {id: C1, conductor: copper, insulation: xlpe, size: \"00 AWG\", fault_ka: {min: 2, max: 15}}\n"
    + "  - {id: C2, conductor: copper, insulation: xlpe, size: \"0000 AWG\", fault_ka: {min: 2, max: 15}}\n"
    + "devices:\n" + RELAY + "checks:\n  - {cable: C1, device: R1}\n  - {cable: C2, device: R1}\n")
FUSE_PAIR = (HEAD.format(title="Fuses graded by energy", kv=0.4) + "devices:\n"
    + "  - id: FU\n    type: fuse\n    rating_a: 315\n    category: gG\n    series: NH-A\n"
    + "    melting:  [[630, 2000], [1000, 100], [1600, 8], [2500, 0.8], [4000, 0.09], [7000, 0.01]]\n"
    + "    clearing: [[630, 2400], [1000, 130], [1600, 10], [2500, 1.0], [4000, 0.12], [7000, 0.016]]\n"
    + "    pre_arcing_i2t: [[7, 490000], [20, 520000], [50, 560000]]\n"
    + "  - id: FD\n    type: fuse\n    rating_a: 160\n    category: gG\n    series: NH-A\n"
    + "    melting: [[320, 1500], [500, 60], [800, 5], [1250, 0.5], [2000, 0.05], [3500, 0.008]]\n"
    + "    clearing: [[320, 1800], [500, 75], [800, 6.5], [1250, 0.65], [2000, 0.07], [3500, 0.012]]\n"
    + "    clearing_i2t: [[3.5, 147000], [10, 160000], [50, 190000]]\n"
    + "checks:\n  - {upstream: FU, downstream: FD, rating_ratio: 1.6, range_ka: {min: 0.8, max: 50}}\n")
valid["fuse-energies-by-points"] = FUSE_PAIR
valid["relay-tolerance-stated"] = BASE.replace("    breaker_s: 0.05\n", "    breaker_s: 0.05\n"
    "    tolerance: {time_percent: 5, time_min_s: 0.03, pickup_percent: 5}\n", 1)
valid["relay-high-current-stated"] = BASE.replace("tms: 0.2}", "tms: 0.2, high_current: band}").replace(
    "pickup_a: 10000}", "pickup_a: 10000, delay_s: 0.03}")
valid["mcb-let-through-points"] = (HEAD.format(title="Breaker with a let-through curve", kv=0.23)
    + "cables:\n  - {id: C1, conductor: copper, insulation: pvc, size_mm2: 2.5, fault_ka: {min: 0.3, max: 6}}\n"
    + "devices:\n  - {id: M1, type: mcb, curve_type: C, rating_a: 16, fastest_s: 0.004,"
    + " let_through_i2t: [[0.5, 6000], [1, 9000], [3, 17000], [6, 25000]]}\n"
    + "checks:\n  - {cable: C1, device: M1}\n")
valid["cable-medium-voltage"] = (HEAD.format(title="An 11 kV cable", kv=11)
    + "cables:\n  - {id: C1, conductor: aluminium, insulation: xlpe, size_mm2: 185, voltage_kv: 11,"
    + " fault_ka: {min: 2, max: 12}}\n" + "devices:\n  - id: R1\n    type: relay\n    breaker_s: 0.07\n"
    + "    stages:\n      - {curve: iec-standard-inverse, pickup_a: 300, tms: 0.1}\n"
    + "      - {curve: instantaneous, pickup_a: 4000, delay_s: 0.04}\n"
    + "checks:\n  - {cable: C1, device: R1, dc_offset: {x_r: 14}}\n")
valid["check-dc-offset-none"] = BASE.replace("margin_s: 0.1}", "margin_s: 0.1, dc_offset: none}")
valid["grading-interval-to-clearing"] = BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    breaker_s: 0.05\n"
    "    stages:\n      - {curve: iec-standard-inverse, pickup_a: 600, tms: 0.35}\n"
    "checks:\n") + "  - {upstream: R0, downstream: R1, interval_s: 0.3, interval_to: clearing-time, range_ka: {min: 1.5, max: 12}}\n"
valid["empty-checks"] = HEAD.format(title="A study with nothing to check yet", kv=11) + "devices:\n" + RELAY

BASE_LINES = BASE
invalid = {
    "unknown-top-key": BASE.replace("voltage_kv: 0.4", "voltage_kv: 0.4\nvoltage: 0.4"),
    "missing-title": BASE.replace("title: Conformance base\n", ""),
    "missing-format": BASE.replace("format: 1\n", ""),
    "format-two": BASE.replace("format: 1", "format: 2"),
    "voltage-text": BASE.replace("voltage_kv: 0.4", "voltage_kv: low"),
    "voltage-zero": BASE.replace("voltage_kv: 0.4", "voltage_kv: 0"),
    "page-unknown": BASE.replace("voltage_kv: 0.4", "voltage_kv: 0.4\npage: a3"),
    "duplicate-key": BASE.replace("    size_mm2: 70\n", "    size_mm2: 70\n    size_mm2: 95\n"),
    "anchor-and-alias": BASE.replace("fault_ka: {min: 1.5, max: 12}", "fault_ka: &f {min: 1.5, max: 12}")
        .replace("margin_s: 0.1}", "margin_s: 0.1, range_ka: *f}"),
    "syntax-error": BASE.replace("stages:\n", "stages: [\n", 1),
    "cable-unknown-conductor": BASE.replace("conductor: copper", "conductor: gold"),
    "cable-unknown-insulation": BASE.replace("insulation: xlpe", "insulation: cotton"),
    "cable-size-both": BASE.replace("size_mm2: 70", "size_mm2: 70\n    size: \"4/0 AWG\""),
    "cable-size-missing": BASE.replace("    size_mm2: 70\n", ""),
    "cable-size-bad-awg": BASE.replace("size_mm2: 70", "size: \"5/0 AWG\""),
    "cable-size-negative": BASE.replace("size_mm2: 70", "size_mm2: -70"),
    "cable-parallel-fraction": BASE.replace("size_mm2: 70", "size_mm2: 70\n    parallel: 1.5"),
    "cable-initial-above-final": BASE.replace("size_mm2: 70", "size_mm2: 70\n    initial_c: 300"),
    "cable-load-and-initial": BASE.replace("size_mm2: 70", "size_mm2: 70\n    initial_c: 60\n    load: {current_a: 50, rated_a: 100}"),
    "cable-method-unknown": BASE.replace("size_mm2: 70", "size_mm2: 70\n    method: guess"),
    "cable-fault-inverted": BASE.replace("fault_ka: {min: 1.5, max: 12}", "fault_ka: {min: 12, max: 1.5}"),
    "cable-duplicate-id": BASE.replace("devices:\n", CABLE + "devices:\n"),
    "cable-non-adiabatic-rubber": BASE.replace("insulation: xlpe", "insulation: rubber-60\n    method: non-adiabatic"),
    "device-unknown-type": BASE.replace("type: relay", "type: recloser"),
    "device-missing-id": BASE.replace("  - id: R1\n    type: relay", "  - type: relay"),
    "relay-no-stages": BASE.replace(RELAY, "  - id: R1\n    type: relay\n    stages: []\n"),
    "relay-stage-typo": BASE.replace("pickup_a: 250", "pikup_a: 250"),
    "relay-pickup-text": BASE.replace("pickup_a: 3000", "pickup_a: abc"),
    "relay-tms-zero": BASE.replace("tms: 0.2", "tms: 0"),
    "relay-tms-on-ieee": BASE.replace("curve: iec-standard-inverse, pickup_a: 250, tms: 0.2",
        "curve: ieee-very-inverse, pickup_a: 250, tms: 0.2"),
    "relay-unknown-curve": BASE.replace("iec-standard-inverse", "iec-normal-inverse"),
    "relay-negative-breaker": BASE.replace("breaker_s: 0.05", "breaker_s: -0.05"),
    "relay-ct-missing-secondary": BASE.replace("breaker_s: 0.05", "breaker_s: 0.05\n    ct: {primary_a: 400}"),
    "relay-multiplier-outside-range": BASE.replace("tms: 0.2}", "tms: 1.2, tms_range: [0.05, 1.0]}"),
    "relay-range-of-other-kind": BASE.replace("curve: iec-standard-inverse, pickup_a: 250, tms: 0.2",
        "curve: ieee-very-inverse, pickup_a: 250, time_dial: 2, tms_range: [0.05, 1]"),
    "relay-tolerance-too-wide": BASE.replace("    breaker_s: 0.05\n", "    breaker_s: 0.05\n"
        "    tolerance: {time_percent: 80, pickup_percent: 5}\n", 1),
    "relay-high-current-unknown": BASE.replace("tms: 0.2}", "tms: 0.2, high_current: clamp}"),
    "fuse-energy-twice": FUSE_PAIR.replace("    pre_arcing_i2t:", "    pre_arcing_i2t_a2s: 500000\n    pre_arcing_i2t:"),
    "fuse-category-unknown": FUSE_PAIR.replace("category: gG\n    series: NH-A\n    melting:  ", "category: gX\n    series: NH-A\n    melting:  "),
    "fuse-energy-currents-fall": FUSE_PAIR.replace("[[3.5, 147000], [10, 160000], [50, 190000]]", "[[3.5, 147000], [2, 160000]]"),
    "mcb-let-through-not-pair": BASE.replace("devices:\n", "devices:\n  - {id: M1, type: mcb, curve_type: B, rating_a: 16,"
        " let_through_i2t: [[1, 5000], [3]]}\n"),
    "cable-non-adiabatic-medium-voltage": BASE.replace("size_mm2: 70", "size_mm2: 70\n    voltage_kv: 11\n    method: non-adiabatic"),
    "cable-icea-without-temperatures": BASE.replace("insulation: xlpe", "insulation: rubber-60\n    method: icea"),
    "check-dc-offset-kappa-and-x-r": BASE.replace("margin_s: 0.1}", "margin_s: 0.1, dc_offset: {kappa: 1.8, x_r: 10}}"),
    "check-dc-offset-word": BASE.replace("margin_s: 0.1}", "margin_s: 0.1, dc_offset: off}"),
    "grading-interval-to-unknown": BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    stages:\n      - {curve: iec-very-inverse, pickup_a: 600, tms: 0.4}\nchecks:\n")
        + "  - {upstream: R0, downstream: R1, interval_s: 0.3, interval_to: clearing, range_ka: {min: 1.5, max: 12}}\n",
    "relay-hold-bad-multiple": BASE.replace("tms: 0.2}", "tms: 0.2, high_current: hold, upper_multiple: 1}"),
    "fuse-rising-curve": HEAD.format(title="Rising fuse", kv=0.4) + "devices:\n  - id: F1\n    type: fuse\n    rating_a: 100\n"
        "    melting: [[200, 100], [400, 10], [800, 1]]\n    clearing: [[200, 120], [400, 12], [800, 30]]\n",
    "fuse-point-not-pair": HEAD.format(title="Bad point", kv=0.4) + "devices:\n  - id: F1\n    type: fuse\n    rating_a: 100\n"
        "    melting: [[200, 100], [400], [800, 1]]\n    clearing: [[200, 120], [400, 12], [800, 3]]\n",
    "fuse-too-many-points": HEAD.format(title="Many points", kv=0.4) + "devices:\n  - id: F1\n    type: fuse\n    rating_a: 100\n"
        "    melting: [" + ", ".join("[%d, %g]" % (100 + i, 1000.0 / (i + 1)) for i in range(501)) + "]\n"
        "    clearing: [[200, 120], [400, 12], [800, 3]]\n",
    "fuse-clearing-below-melting": HEAD.format(title="Clearing faster than melting", kv=0.4) + "devices:\n  - id: F1\n    type: fuse\n"
        "    rating_a: 100\n    melting: [[200, 100], [400, 10], [800, 1]]\n    clearing: [[200, 90], [400, 12], [800, 3]]\n",
    "breaker-isd-below-ir": HEAD.format(title="Isd below Ir", kv=0.4) + "devices:\n  - {id: Q1, type: breaker, ir_a: 630, tr_s: 10, isd_a: 500, tsd_s: 0.2}\n",
    "breaker-isd-without-tsd": HEAD.format(title="Isd without tsd", kv=0.4) + "devices:\n  - {id: Q1, type: breaker, ir_a: 630, tr_s: 10, isd_a: 4000}\n",
    "breaker-band-inverted": HEAD.format(title="Band inverted", kv=0.4) + "devices:\n  - {id: Q1, type: breaker, ir_a: 630, tr_s: 10, long_time_band: [1.3, 1.05]}\n",
    "mcb-type-e": HEAD.format(title="MCB type E", kv=0.4) + "devices:\n  - {id: M1, type: mcb, curve_type: E, rating_a: 16}\n",
    "mcb-rating-too-big": HEAD.format(title="MCB too big", kv=0.4) + "devices:\n  - {id: M1, type: mcb, curve_type: C, rating_a: 160}\n",
    "check-unknown-device": BASE.replace("device: R1", "device: R2"),
    "check-unknown-cable": BASE.replace("cable: C1", "cable: C9"),
    "check-both-margins": BASE.replace("margin_s: 0.1}", "margin_s: 0.1, margin_ratio: 2}"),
    "check-ratio-below-one": BASE.replace("margin_s: 0.1}", "margin_ratio: 0.5}"),
    "check-neither-kind": BASE.replace("{cable: C1, device: R1, margin_s: 0.1}", "{margin_s: 0.1}"),
    "check-kappa-above-two": BASE.replace("margin_s: 0.1}", "margin_s: 0.1, dc_offset: {kappa: 2.5}}"),
    "check-no-range": BASE.replace("    fault_ka: {min: 1.5, max: 12}\n", ""),
    "grading-no-range": BASE + "  - {upstream: R1, downstream: R1, interval_s: 0.3}\n",
    "grading-ratio-on-relays": BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    stages:\n      - {curve: iec-very-inverse, pickup_a: 600, tms: 0.4}\nchecks:\n")
        + "  - {upstream: R0, downstream: R1, rating_ratio: 1.6, range_ka: {min: 1.5, max: 12}}\n",
    "grading-two-requirements": BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    stages:\n      - {curve: iec-very-inverse, pickup_a: 600, tms: 0.4}\nchecks:\n")
        + "  - {upstream: R0, downstream: R1, interval_s: 0.3, no_overlap: true, range_ka: {min: 1.5, max: 12}}\n",
    "not-a-mapping": "- just\n- a list\n",
    "empty-file": "",
    "two-documents": BASE + "---\nformat: 1\n",
    "lists-where-maps-belong": BASE.replace("fault_ka: {min: 1.5, max: 12}", "fault_ka: [1.5, 12]"),
}

# Hostile inputs: kept apart from the valid cases, so they are no seeds of the fuzz test.
BREAKER = HEAD.format(title="Trip unit", kv=0.4) + "cables:\n" + CABLE + "devices:\n" + \
    "  - {id: Q1, type: breaker, ir_a: 250, tr_s: 10, isd_a: 2500, tsd_s: 0.4, tsd_i2t: true}\n" + \
    "checks:\n  - {cable: C1, device: Q1}\n"
hostile = {
    "boolean-yes": BREAKER.replace("tsd_i2t: true", "tsd_i2t: yes"),
    "boolean-on": BASE.replace("checks:\n", "  - id: R0\n    type: relay\n    stages:\n      - {curve: iec-very-inverse, pickup_a: 600, tms: 0.4}\nchecks:\n")
        + "  - {upstream: R0, downstream: R1, no_overlap: on, range_ka: {min: 1.5, max: 12}}\n",
    "octal-pickup": BASE.replace("pickup_a: 250", "pickup_a: 0250"),
    "hex-format": BASE.replace("format: 1", "format: 0x1"),
    "underscore-number": BASE.replace("pickup_a: 3000", "pickup_a: 3_000"),
    "tag-on-title": BASE.replace("title: Conformance base", "title: !!int 5"),
    "kcmil-huge": BASE.replace("size_mm2: 70", "size: \"99999999999999999999 kcmil\""),
    "many-problems": BASE + "".join("unknown_%d: 1\n" % i for i in range(150)),
    "long-unknown-references": HEAD.format(title="Long references", kv=0.4) + "cables:\n"
        + "".join("  - {id: C%d, conductor: copper, insulation: xlpe, size_mm2: 70, fault_ka: {min: 1.5, max: 12}}\n" % i
                  for i in range(30))
        + "devices:\n" + RELAY + "checks:\n"
        + "".join("  - {cable: %s, device: R1}\n" % ("C" + "x" * 480 + str(i)) for i in range(3)),
    "control-character-escaped": BASE.replace("title: Conformance base", "title: \"bell\\u0007 and clear \\e[2J\""),
    "control-character-raw": BASE.replace("title: Conformance base", "title: raw \x01 byte"),
    "key-with-line-break": BASE.replace("    size_mm2: 70\n", "    size_mm2: 70\n    \"forged\\nstudy.yaml:1:1: key\": 1\n"),
    "bidi-override": BASE.replace("title: Conformance base", "title: \"Feeder \u202egnol\""),
    "lone-surrogate": BASE.replace("title: Conformance base", "title: \"half \\ud800 pair\""),
    "long-date": BASE.replace("voltage_kv: 0.4", "voltage_kv: 0.4\ndate: \"" + "9" * 600 + "\""),
    "long-number": BASE.replace("pickup_a: 250", "pickup_a: 1" + "0" * 1200),
    "long-id": BASE.replace("id: C1", "id: C" + "1" * 40).replace("cable: C1", "cable: C" + "1" * 40),
}
for name, text in hostile.items():
    invalid["hostile-" + name] = text

for d in ("valid", "invalid"):
    for f in os.listdir(d):
        if f.endswith(".yaml"):
            os.remove(os.path.join(d, f))
for name, text in valid.items():
    write("valid", name, text)
for name, text in invalid.items():
    write("invalid", name, text)
print(len(valid), "valid,", len(invalid), "invalid")
