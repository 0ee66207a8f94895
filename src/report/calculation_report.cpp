#include "pinproof/report/calculation_report.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <optional>
#include <sstream>
#include <utility>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/joints/classification.hpp"
#include "pinproof/joints/nonlinear_analysis.hpp"
#include "pinproof/checks/governing_check.hpp"
#include "pinproof/report/beam_elevation.hpp"
#include "pinproof/report/cantilever_elevation.hpp"
#include "pinproof/report/beam_line_chart.hpp"
#include "pinproof/report/report_style.hpp"
#include "pinproof/report/detail_drawing.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/checks/gap_geometry.hpp"
#include "pinproof/model/natural_frequency.hpp"
#include "pinproof/model/result_fields.hpp"
#include "pinproof/report/svg_chart.hpp"
#include "pinproof/checks/sweep.hpp"
#include "pinproof/report/text_report.hpp"
#include "pinproof/report/sweep_output.hpp"
#include "core/sha256.hpp"

namespace pinproof {

std::string html_escape(std::string_view text)
{
    std::string out;
    out.reserve(text.size());
    for (char c : text) {
        switch (c) {
        case '&': out += "&amp;"; break;
        case '<': out += "&lt;"; break;
        case '>': out += "&gt;"; break;
        case '"': out += "&quot;"; break;
        case '\'': out += "&#39;"; break;
        default: out += (static_cast<unsigned char>(c) < 0x20 && c != '\t' && c != '\n' && c != '\r') ? "\xEF\xBF\xBD" : std::string(1, c);  // XML 1.0 2.2: no C0 but tab, LF, CR
        }
    }
    return out;
}

std::string input_hash(std::string_view bytes) { return sha256_hex(bytes); }

beam_line beam_line_of(const beam& b, const combination& c, beam_end e)
{
    const beam_model model(b.span, b.EI(), factored_loads(b.loads, c));
    const bool start = e == beam_end::start;
    beam_line l;
    l.end = e;
    l.far_end = start ? b.end.range.min : b.start.range.min;
    const auto fixed = start ? model.end_moments(stiffness::rigid(), l.far_end)
                             : model.end_moments(l.far_end, stiffness::rigid());
    l.fixed_moment = start ? fixed[0] : fixed[1];
    const beam_state pinned = start ? model.solve(stiffness::pinned(), l.far_end)
                                    : model.solve(l.far_end, stiffness::pinned());
    l.pinned_rotation = start ? pinned.rotation_start : pinned.rotation_end;
    // M = S theta and M = M_F (1 - theta / theta_s) meet at
    // theta = M_F theta_s / (S theta_s + M_F).
    auto meet = [&](stiffness s) {
        beam_line_point p;
        p.joint = s;
        if (s.is_rigid()) {
            p.rotation = 0;
            p.moment = l.fixed_moment;
            return p;
        }
        const double den = s.value() * l.pinned_rotation + l.fixed_moment;
        p.rotation = den == 0.0 ? 0.0 : l.fixed_moment * l.pinned_rotation / den;
        p.moment = s.value() * p.rotation;
        return p;
    };
    const stiffness_range& r = b.at(e).range;
    l.lower = meet(r.min);
    l.upper = meet(r.max);
    return l;
}

namespace {

struct units_view {
    unit_system system;
    display_unit unit(dimension d) const { return display_unit_for(d, system); }
    std::string sym(dimension d) const { return unit(d).symbol; }
    double in(double si, dimension d) const
    {
        const double v = si / unit(d).si_per_unit;
        return std::abs(v) < 1e-12 ? 0.0 : v;
    }
    std::string num(double si, dimension d, int sig = 4) const { return format_number(in(si, d), sig); }
    std::string q(double si, dimension d, int sig = 4) const
    {
        const std::string s = sym(d);
        return num(si, d, sig) + (s.empty() ? "" : " " + s);
    }
    // Positions along the beam in m (ft).
    bool us() const { return system == unit_system::us_customary; }
    std::string pos_unit() const { return us() ? "ft" : "m"; }
    double pos_in(double m) const { return us() ? m / 0.3048 : m; }
    std::string pos(double m) const { return format_number(std::abs(m) < 1e-12 ? 0.0 : pos_in(m), 4) + " " + pos_unit(); }
    std::string stiff(stiffness s) const
    {
        return s.is_rigid() ? std::string("rigid") : q(s.value(), dims::rotational_stiffness);
    }
};

std::string esc(const std::string& s) { return html_escape(s); }


std::string status_class(check_status s)
{
    switch (s) {
    case check_status::pass: return "pass";
    case check_status::fail: return "fail";
    case check_status::warn: return "warn";
    case check_status::not_applicable: return "na";
    }
    return "na";
}

std::string standard_name(design_standard s)
{
    return s == design_standard::en1993_1_8 ? "EN 1993-1-8:2005" : "AISC 360-16";
}

// An SVG document made fit to sit inline in the report: no XML declaration or
// namespace attributes (HTML supplies the namespace), scaled to the column
// width by its viewBox, and every id (and reference to it) made unique in the
// page so that two charts never share a clip path.
std::string inline_svg(std::string svg, int index)
{
    if (svg.compare(0, 5, "<?xml") == 0) svg.erase(0, svg.find("?>") + 2);
    const std::size_t open = svg.find("<svg");
    if (open == std::string::npos) throw internal_error("a report figure is not an SVG document");
    svg.erase(0, open);
    std::size_t tag_end = svg.find('>');
    std::string tag = svg.substr(0, tag_end);
    auto drop_attribute = [&tag](const std::string& name) {
        for (;;) {
            const std::size_t at = tag.find(" " + name + "=\"");
            if (at == std::string::npos) return;
            const std::size_t close = tag.find('"', at + name.size() + 3);
            tag.erase(at, close + 1 - at);
        }
    };
    drop_attribute("xmlns");
    drop_attribute("xmlns:xlink");
    drop_attribute("width");
    drop_attribute("height");
    drop_attribute("style");
    tag += " width=\"100%\" preserveAspectRatio=\"xMidYMid meet\" role=\"img\"";
    svg = tag + svg.substr(tag_end);
    // Unique ids.
    std::vector<std::string> ids;
    for (std::size_t at = svg.find(" id=\""); at != std::string::npos; at = svg.find(" id=\"", at + 1)) {
        const std::size_t b = at + 5, e = svg.find('"', b);
        ids.push_back(svg.substr(b, e - b));
    }
    const std::string prefix = "f" + std::to_string(index) + "-";
    auto replace_all = [&svg](const std::string& from, const std::string& to) {
        for (std::size_t at = svg.find(from); at != std::string::npos; at = svg.find(from, at + to.size()))
            svg.replace(at, from.size(), to);
    };
    for (const auto& id : ids) {
        replace_all(" id=\"" + id + "\"", " id=\"" + prefix + id + "\"");
        replace_all("url(#" + id + ")", "url(#" + prefix + id + ")");
        replace_all("href=\"#" + id + "\"", "href=\"#" + prefix + id + "\"");
    }
    return svg;
}

class report_writer {
public:
    report_writer(const project& p, const project_assessment& a, const report_info& info)
        : p_(p), a_(a), info_(info), u_{p.units}
    {
    }
    std::string write();

private:
    void figure(const std::string& kind, const std::string& svg, const std::string& caption);
    void head();
    void title_block();
    void method();
    void beam_section(const beam_assessment& ba);
    void inputs(const beam& b);
    void joints(const beam& b, const beam_assessment& ba);
    void derived_joints(const beam& b);
    std::string derived_joint_block(const joint& jt, const derived_joint& d) const;
    void connection_inputs(const beam& b);
    void combination_block(const beam& b, const combination_result& r);
    void results_table(const beam& b, const combination_result& r);
    void frequency_rows(const combination_result& r, bool with_estimate);
    void tip_rows(const combination_result& r);
    void span_diagrams(const beam& b, const combination_result& r);
    void sweep_chart(const beam& b);
    void beam_lines(const beam& b);
    void beam_line_chart(const beam& b, const combination& c, beam_end e);
    void law_beam_line_chart(const beam& b, beam_end e);
    std::string page_style() const;
    void gap_drawings(const beam& b, const beam_assessment& ba);
    void checks(const beam_assessment& ba);
    void verdict(const beam_assessment& ba);
    void closing();

    const project& p_;
    const project_assessment& a_;
    const report_info& info_;
    units_view u_;
    std::ostringstream o_;
    int figures_ = 0;
    int beams_ = 0;
};

void report_writer::figure(const std::string& kind, const std::string& svg, const std::string& caption)
{
    ++figures_;
    o_ << "<figure class=\"chart\" data-chart=\"" << esc(kind) << "\">\n" << inline_svg(svg, figures_)
       << "<figcaption>Figure " << figures_ << ". " << esc(caption) << "</figcaption>\n</figure>\n";
}

// The printed page: A4 (Letter for a project in US units) with margins that
// leave a 174 mm column on either, and the calc sheet's running header and
// footer in the page-margin boxes (CSS Paged Media Level 3, 5.3): the job and
// the calculation's title at the top; who made and checked it, the revision,
// the date and "Sheet x of y" at the foot.
std::string report_writer::page_style() const
{
    const job_info job = p_.job.value_or(job_info{});
    const auto joined = [](std::initializer_list<std::string> parts) {
        std::string out;
        for (const auto& t : parts)
            if (!t.empty()) out += (out.empty() ? "" : "  |  ") + t;
        return out;
    };
    const std::string job_line = joined({job.number.empty() ? std::string() : "Job " + job.number, job.title});
    const std::string calc_line = p_.title.empty() ? std::string("Calculation report") : p_.title;
    const std::string people = joined({job.made_by.empty() ? std::string() : "Made by " + job.made_by,
                                       job.checked_by.empty() ? std::string() : "Checked by " + job.checked_by,
                                       job.revision.empty() ? std::string() : "Rev " + job.revision, job.date});
    return page_margin_boxes(p_.units, job_line.empty() ? calc_line : job_line, job_line.empty() ? "" : calc_line,
                             people.empty() ? "pinproof " + info_.version + " calculation report" : people);
}

void report_writer::head()
{
    o_ << "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
       << "<meta name=\"generator\" content=\"pinproof " << esc(info_.version) << "\">\n"
       << "<title>" << esc(p_.title.empty() ? std::string("pinproof calculation report") : p_.title)
       << " - calculation report</title>\n"
       << "<style>\n" << page_style()
       << report_stylesheet() << "</style>\n</head>\n<body>\n";
}

void report_writer::title_block()
{
    o_ << "<header>\n<h1>Calculation report: simple-support assumption of beams on semi-rigid joints</h1>\n";
    std::string ids;
    for (const auto& b : a_.beams) ids += (ids.empty() ? "" : ", ") + b.id;
    o_ << "<table class=\"kv\" id=\"title-block\">\n";
    if (p_.job) {
        const job_info& j = *p_.job;
        const std::pair<const char*, const std::string*> rows[] = {
            {"Job number", &j.number}, {"Job", &j.title},          {"Made by", &j.made_by},
            {"Checked by", &j.checked_by}, {"Revision", &j.revision}, {"Revision date", &j.date}};
        for (const auto& [label, value] : rows)
            if (!value->empty()) o_ << "<tr><th>" << label << "</th><td>" << esc(*value) << "</td></tr>\n";
    }
    o_ << "<tr><th>Project</th><td>" << esc(p_.title) << "</td></tr>\n"
       << "<tr><th>Beams</th><td>" << esc(ids) << "</td></tr>\n"
       << "<tr><th>Date</th><td>" << esc(info_.date) << "</td></tr>\n"
       << "<tr><th>Software</th><td>pinproof " << esc(info_.version) << "</td></tr>\n"
       << "<tr><th>Input file</th><td>" << esc(info_.input_file) << "</td></tr>\n"
       << "<tr><th>Input SHA-256</th><td class=\"hash\">" << esc(info_.input_sha256) << "</td></tr>\n"
       << "<tr><th>Standard</th><td>" << standard_name(p_.standard) << ", " << esc(to_string(p_.frame))
       << " frame</td></tr>\n"
       << "<tr><th>Units shown</th><td>" << (u_.us() ? "US customary" : "SI") << "</td></tr>\n"
       << "</table>\n";
    const auto holding = std::count_if(a_.beams.begin(), a_.beams.end(), [](const beam_assessment& b) { return b.holds(); });
    const bool all = a_.all_hold();
    // The assumption the verdict speaks of: pinned ends for beams on two
    // supports, a fixed root for cantilevers, both where the project has both.
    std::size_t cantilevers = 0;
    for (const auto& b : a_.beams) cantilevers += b.input && b.input->layout == beam_layout::cantilever ? 1 : 0;
    const std::string assumption = cantilevers == 0 ? "the simple-support (pinned) assumption"
                                   : cantilevers == a_.beams.size()
                                       ? "the fixed-root assumption"
                                       : "the assumed supports (pinned ends; fixed roots of the cantilevers)";
    o_ << "<div class=\"verdict " << (all ? "pass" : "fail") << "\" id=\"overall-verdict\">Verdict: ";
    if (all)
        o_ << assumption << (cantilevers == 0 || cantilevers == a_.beams.size() ? " HOLDS" : " HOLD") << " for every beam ("
           << a_.beams.size() << " of " << a_.beams.size() << ").";
    else
        o_ << assumption << (cantilevers == 0 || cantilevers == a_.beams.size() ? " DOES NOT HOLD" : " DO NOT HOLD")
           << " for " << a_.beams.size() - holding << " of " << a_.beams.size() << " beams.";
    // The summary sheet: per beam its verdict, the check that governs (the
    // largest utilisation, or a failure: checks/governing_check.hpp), the
    // classes of its joints over their stiffness ranges, and what fails.
    const bool en = p_.standard == design_standard::en1993_1_8;
    o_ << "</div>\n<table>\n<thead><tr><th>Beam</th><th>Verdict</th><th>Governing check</th><th>Joint classes ("
       << (en ? "EN 1993-1-8" : "AISC 360") << ", lower .. upper bound)</th><th>Failed checks</th></tr></thead>\n";
    for (const auto& b : a_.beams) {
        std::string failed;
        for (const auto& c : b.checks)
            if (c.status == check_status::fail) failed += (failed.empty() ? "" : ", ") + c.id;
        std::string governing = "none";
        if (const check* g = governing_check(b)) {
            const auto u = utilisation(*g);
            governing = g->id + (u ? " (" + format_number(*u, 3) + ")" : std::string());
        }
        std::string classes;
        const bool cantilever = b.input && b.input->layout == beam_layout::cantilever;
        const bool no_end_joint = b.input && b.input->layout != beam_layout::two_supports;
        for (const auto* j : {&b.start, &b.end}) {
            if (no_end_joint && j == &b.end) continue;  // a free tip, or a beam continuous over the end support
            classes += (classes.empty() ? "" : "; ") + (cantilever ? std::string("root") : to_string(j->end)) + ": " +
                       (en ? to_string(j->en_lower) + " .. " + to_string(j->en_upper)
                           : to_string(j->aisc_lower) + " .. " + to_string(j->aisc_upper));
        }
        o_ << "<tr><td class=\"id\">" << esc(b.id) << "</td><td class=\"status " << (b.holds() ? "pass\">HOLDS" : "fail\">DOES NOT HOLD")
           << "</td><td><code>" << esc(governing) << "</code></td><td>" << esc(classes) << "</td><td>"
           << (failed.empty() ? "none" : esc(failed)) << "</td></tr>\n";
    }
    o_ << "</table>\n";
    o_ << "<div class=\"caution\"><strong>Caution.</strong> " << esc(caution_text)
       << " This report is for review by a qualified engineer.</div>\n</header>\n";
}

void report_writer::method()
{
    const double kb = en_rigid_limit(p_.frame);
    o_ << "<section id=\"method\">\n<h2>Assumptions and method</h2>\n<ul>\n"
       << "<li>Each beam is a uniform, straight, linear elastic Euler-Bernoulli beam between two vertical supports; "
          "each end is restrained by a rotational spring of stiffness S (0 a pin, rigid an exact fixity). "
          "Shear deformation, axial force and second-order effects are not included.</li>\n"
       << "<li>The joint stiffness is not known exactly: each end is given a range S<sub>min</sub> .. S<sub>max</sub>. "
          "Results are given for ideal pins, ideal fixity and the four corners of the range box; every result at a "
          "point is monotone in each stiffness, so its extremes lie at the corners. The smallest span moment and "
          "deflection are also searched inside the box.</li>\n"
       << "<li>Joints are classified by &kappa; = S L / (E I): EN 1993-1-8:2005 5.2.2.5(1), nominally pinned for "
          "&kappa; &le; 0.5 and rigid for &kappa; &ge; "
       << format_number(kb, 2) << " (" << esc(to_string(p_.frame))
       << " frame); AISC 360-16 Commentary B3.4, simple for &kappa; &le; 2 and fully restrained for &kappa; &ge; 20. "
          "The fixity factor is r = &kappa; / (&kappa; + 3) (Monforton and Wu, 1963).</li>\n"
       << "<li>A joint with a declared moment resistance is checked against the largest end moment it attracts "
          "under strength combinations; the end rotation is compared with about 30 mrad, a rule of thumb for simple "
          "connections (advisory, a warning only); the service deflection with the given limit.</li>\n"
       << "<li>Signs: loads and deflections downward positive, bending moment sagging positive, end moments hogging "
          "positive, end rotations positive in the sense a simply supported beam turns under gravity load.</li>\n"
       << "<li>The beam line of an end: with the far joint held at its lower-bound stiffness, the end moment falls "
          "linearly from M<sub>F</sub> (this joint rigid) at zero rotation to zero at &theta;<sub>s</sub> (this joint "
          "pinned). A joint carries M = S &theta;; where the lines meet is the analysed state.</li>\n"
       << "<li>The verdict for a beam holds when no check fails. A warning is information to pass on; it does not "
          "change the verdict.</li>\n";
    if (std::any_of(p_.beams.begin(), p_.beams.end(), [](const beam& b) { return b.layout == beam_layout::cantilever; }))
        o_ << "<li>A cantilever has one support, its root at the start, restrained by the root joint's spring; its "
              "end is a free tip. It is statically determinate: the root moment and reaction follow from statics, and "
              "a spring root of stiffness S turns through &theta; = M<sub>root</sub> / S, which adds &theta; x to "
              "the deflection of the cantilever with a rigid root. The ideal bound is the rigid root; a pinned root "
              "is a mechanism and is not shown. The fixed root holds where the root's least &kappa; = S L / EI "
              "(L the cantilever's length) reaches the rigid boundary of the standard and the root's flexibility "
              "raises the deflection by no more than the root-flexibility limit (docs/method/layouts.md). Its tip "
              "rotation is -dw/dx at the tip, negative as the tip drops under gravity.</li>\n";
    if (std::any_of(p_.beams.begin(), p_.beams.end(), [](const beam& b) { return b.layout == beam_layout::overhang; }))
        o_ << "<li>An overhang has a support at the start, restrained by the start joint's spring, and one at the "
              "span L, over which the beam runs on, continuous, to a free tip at L + a; positions are from the start. "
              "The moment over the end support follows from the statics of the overhang; the start moment is the one "
              "redundant. The end moment is that hogging moment over the end support; the maximum deflection and "
              "rotation_end belong to the back span and the end support, the tip rows to the tip (its rotation "
              "-dw/dx, negative as the tip drops). A span/n limit is taken with 2a at the tip (the tip read as a "
              "cantilever: common practice, no source; docs/method/layouts.md).</li>\n";
    o_ << "</ul>\n</section>\n";
}

void report_writer::inputs(const beam& b)
{
    o_ << "<h3>Inputs</h3>\n<table class=\"kv\">\n"
       << "<tr><th>Description</th><td>" << esc(b.description) << "</td></tr>\n"
       << "<tr><th>Section</th><td>" << esc(b.sec.name) << "</td></tr>\n"
       << (b.layout == beam_layout::cantilever
               ? "<tr><th>Layout</th><td>cantilever: root at the start, free tip at the end</td></tr>\n"
                 "<tr><th>Length L (root to tip)</th><td>" + u_.pos(b.span) + "</td></tr>\n" +
                     "<tr><th>Root flexibility limit</th><td>" + format_number(100 * b.root_flexibility_limit, 3) +
                     " % of the rigid-root deflection" + (b.root_flexibility_is_default ? " (the default)" : "") +
                     "</td></tr>\n"
           : b.layout == beam_layout::overhang
               ? "<tr><th>Layout</th><td>overhang: supports at the start and at L, continuous over the end support "
                 "to a free tip</td></tr>\n"
                 "<tr><th>Span L (between the supports)</th><td>" + u_.pos(b.span) + "</td></tr>\n" +
                     "<tr><th>Overhang a (end support to tip)</th><td>" + u_.pos(b.overhang) + "</td></tr>\n"
               : "<tr><th>Span L</th><td>" + u_.pos(b.span) + "</td></tr>\n")
       << "<tr><th>Young's modulus E</th><td>" << u_.q(b.E, dims::pressure)
       << (b.E_is_default ? " (not given: the standard's value)" : "") << "</td></tr>\n"
       << "<tr><th>Second moment of area I</th><td>" << u_.q(b.sec.I, dims::second_moment) << "</td></tr>\n"
       << "<tr><th>Depth</th><td>" << u_.q(b.sec.depth, dims::length) << "</td></tr>\n"
       << "<tr><th>EI / L</th><td>" << u_.q(b.EI() / b.span, dims::rotational_stiffness) << "</td></tr>\n"
       << "<tr><th>Deflection limit</th><td>"
       << (b.deflection ? esc(b.deflection->text) + " = " + u_.q(b.deflection->value(b.span), dims::length)
                        : std::string("none given"))
       << "</td></tr>\n</table>\n";
    o_ << "<h4>Loads (unfactored)</h4>\n<table>\n<thead><tr><th>Case</th><th>Kind</th><th>Value</th><th>Position</th></tr></thead>\n";
    for (const auto& l : b.loads) {
        std::string value, where;
        switch (l.kind) {
        case load_kind::point:
            value = u_.q(l.value, dims::force);
            where = "at " + u_.pos(l.from);
            break;
        case load_kind::moment:
            value = u_.q(l.value, dims::moment) + " (clockwise +)";
            where = "at " + u_.pos(l.from);
            break;
        case load_kind::udl:
            value = u_.q(l.value, dims::line_load);
            where = u_.pos(l.from) + " to " + u_.pos(l.to);
            break;
        case load_kind::linear:
            value = u_.q(l.value, dims::line_load) + " to " + u_.q(l.value_end, dims::line_load);
            where = u_.pos(l.from) + " to " + u_.pos(l.to);
            break;
        }
        o_ << "<tr><td>" << esc(l.load_case) << "</td><td>" << esc(to_string(l.kind)) << "</td><td>" << esc(value)
           << "</td><td>" << esc(where) << "</td></tr>\n";
    }
    o_ << "</table>\n<h4>Combinations</h4>\n<table>\n<thead><tr><th>Name</th><th>Use</th><th>Factors</th></tr></thead>\n";
    for (const auto& c : b.combinations)
        o_ << "<tr><td>" << esc(c.name) << "</td><td>" << esc(to_string(c.use)) << "</td><td>"
           << esc(combination_text(c)) << "</td></tr>\n";
    o_ << "</table>\n";
}

void report_writer::joints(const beam& b, const beam_assessment& ba)
{
    const bool en = p_.standard == design_standard::en1993_1_8;
    auto ratio = [](const std::optional<double>& r) { return r ? format_number(*r, 3) : std::string("rigid"); };
    o_ << "<h4>Joints</h4>\n<table>\n<thead><tr><th>End</th><th>S<sub>min</sub> .. S<sub>max</sub></th>"
          "<th>&kappa; = S L / EI</th><th>Fixity r</th><th>Class (lower .. upper bound)</th>"
          "<th>Moment resistance</th></tr></thead>\n";
    const bool cantilever = b.layout == beam_layout::cantilever;
    for (const auto* j : {&ba.start, &ba.end}) {
        if (cantilever && j->end == beam_end::end) {
            o_ << "<tr><td>end</td><td colspan=\"5\">free tip: no joint</td></tr>\n";
            continue;
        }
        if (b.layout == beam_layout::overhang && j->end == beam_end::end) {
            o_ << "<tr><td>end</td><td colspan=\"5\">no joint: the beam runs on, continuous, over the end support to "
                  "its free tip</td></tr>\n";
            continue;
        }
        const auto& mr = b.at(j->end).moment_resistance;
        o_ << "<tr><td>" << (cantilever ? std::string("start (root)") : to_string(j->end)) << "</td><td>" << esc(u_.stiff(j->range.min)) << " .. "
           << esc(u_.stiff(j->range.max)) << "</td><td class=\"num\">" << ratio(j->ratio_lower) << " .. "
           << ratio(j->ratio_upper) << "</td><td class=\"num\">" << format_number(j->fixity_lower, 3) << " .. "
           << format_number(j->fixity_upper, 3) << "</td><td>"
           << (en ? "EN 1993-1-8: " + to_string(j->en_lower) + " .. " + to_string(j->en_upper)
                  : "AISC 360: " + to_string(j->aisc_lower) + " .. " + to_string(j->aisc_upper))
           << "</td><td>" << (mr ? u_.q(*mr, dims::moment) : std::string("not declared")) << "</td></tr>\n";
    }
    o_ << "</table>\n";
    for (const auto& n : ba.notes) o_ << "<p class=\"note\">Note: " << esc(n) << "</p>\n";
}

// Each joint's connection as the assessment used it: every field, given or
// taken as a default, and the default's source, so that no assumption is silent.
void report_writer::connection_inputs(const beam& b)
{
    for (const beam_end e : {beam_end::start, beam_end::end}) {
        const joint& jt = b.at(e);
        if (!jt.detail || jt.detail->inputs.empty()) continue;
        // One compact line of fields (a default marked *), then each default's source.
        o_ << "<p class=\"inputs\"><strong>Connection at the " << to_string(e) << " as used ("
           << esc(to_string(jt.detail->type)) << ", * a default):</strong> ";
        bool first = true;
        for (const detail_input& i : jt.detail->inputs) {
            o_ << (first ? "" : "; ") << "<span class=\"nw\">" << esc(i.field) << " "
               << esc(i.length ? u_.q(*i.length, dims::length) : i.text) << (i.is_default ? "*" : "") << "</span>";
            first = false;
        }
        o_ << ".</p>\n";
        std::string defaults;
        for (const detail_input& i : jt.detail->inputs)
            if (i.is_default) defaults += "<li>* " + esc(i.field) + ": " + esc(i.source) + "</li>\n";
        if (!defaults.empty()) o_ << "<ul class=\"note defaults\">\n" << defaults << "</ul>\n";
    }
}

// Each joint derived from its detail: a table of its components with the
// governing one marked, then its resistances, stiffness and defaults. Two
// ends that derive to the same text (the same detail on the same section
// under the same shear) share one table.
void report_writer::derived_joints(const beam& b)
{
    std::string block[2];
    for (const beam_end e : {beam_end::start, beam_end::end}) {
        const joint& jt = b.at(e);
        if (jt.derived) block[e == beam_end::start ? 0 : 1] = derived_joint_block(jt, *jt.derived);
    }
    const auto heading = [&](const std::string& where, const joint& jt) {
        o_ << "<h4>" << where << " (" << esc(jt.derived->basis) << ", "
           << esc(to_string(jt.detail->type)) << ")</h4>\n";
    };
    if (!block[0].empty() && block[0] == block[1]) {
        heading("Joints at the start and at the end from their details, identical", b.start);
        o_ << block[0];
        return;
    }
    for (const beam_end e : {beam_end::start, beam_end::end}) {
        const std::string& text = block[e == beam_end::start ? 0 : 1];
        if (text.empty()) continue;
        heading("Joint at the " + to_string(e) + " from its detail", b.at(e));
        o_ << text;
    }
}

std::string report_writer::derived_joint_block(const joint& jt, const derived_joint& d) const
{
    std::ostringstream out;  // a block of its own, compared between the ends
    out << "<table>\n<thead><tr><th>Component</th><th>Resistance</th><th>Per bolt</th><th>Source</th></tr></thead>\n";
    for (const joint_component& c : d.components) {
        const bool governs = c.id == d.governing;
        out << "<tr" << (governs ? " class=\"governs\"" : "") << "><td>" << (governs ? "<strong>" : "") << esc(c.id)
           << (governs ? " (governs)</strong>" : "") << "</td><td class=\"num\">"
           << (c.resistance ? u_.q(*c.resistance, dims::force) : std::string("&ndash;")) << "</td><td class=\"num\">"
           << (c.per_bolt ? u_.q(*c.per_bolt, dims::force) : std::string("&ndash;")) << "</td><td>" << esc(c.source)
           << "</td></tr>\n";
    }
    out << "</table>\n<p>Shear resistance " << u_.q(d.shear_resistance, dims::force) << " (" << esc(d.governing)
       << " governs); moment resistance " << u_.q(d.moment_resistance, dims::moment) << " ("
       << esc(d.moment_governing) << ")" << (jt.moment_resistance_from_detail ? ", used as the joint's" : "") << "; ";
    if (d.initial_stiffness)
        out << "initial stiffness S<sub>j,ini</sub> " << u_.q(*d.initial_stiffness, dims::rotational_stiffness)
           << ", range " << format_number(d.scatter_min, 3) << " to " << format_number(d.scatter_max, 3)
           << " times it" << (d.scatter_default ? " (default)" : "") << " = "
           << u_.q(*d.stiffness_min, dims::rotational_stiffness) << " .. " << u_.q(*d.stiffness_max, dims::rotational_stiffness) << (jt.stiffness_from_detail ? ", used as the joint's range" : "");
    else
        out << "initial stiffness not derived (" << esc(d.basis) << " gives no component stiffness)";
    out << "; free rotation before the bolts bear " << u_.q(d.free_rotation, dims::angle) << "; rotation capacity "
       << (d.rotation_capacity_basis.empty() ? std::string("not derived") : esc(d.rotation_capacity_basis)) << ".</p>\n";
    if (!d.tension_rows.empty()) {
        out << "<table>\n<thead><tr><th>Bolt row in tension</th><th>Lever arm</th><th>F<sub>tr,Rd</sub></th>"
               "<th>Governed by</th></tr></thead>\n";
        for (std::size_t i = 0; i < d.tension_rows.size(); ++i) {
            const derived_tension_row& r = d.tension_rows[i];
            out << "<tr><td>" << i + 1 << "</td><td class=\"num\">" << u_.q(r.lever_arm, dims::length)
               << "</td><td class=\"num\">" << u_.q(r.resistance, dims::force) << "</td><td>" << esc(r.governing)
               << "</td></tr>\n";
        }
        out << "</table>\n";
    }
    if (!d.defaults.empty()) {
        out << "<ul class=\"defaults note\">\n";
        for (const auto& s : d.defaults) out << "<li>Assumed: " << esc(s) << "</li>\n";
        out << "</ul>\n";
    }
    for (const auto& s : d.limits_exceeded)
        out << "<p class=\"note\">Beyond the conventional configuration: " << esc(s) << "</p>\n";
    return out.str();
}

void report_writer::combination_block(const beam& b, const combination_result& r)
{
    o_ << "<h3>Combination " << esc(r.comb.name) << " (" << esc(to_string(r.comb.use)) << "): "
       << esc(combination_text(r.comb)) << "</h3>\n";
    results_table(b, r);
    span_diagrams(b, r);
}

// Each result with ideal pins, over the stiffness range, and with fixed ends.
// A cantilever: over the range and with a rigid root (its pinned bound is a mechanism).
void report_writer::results_table(const beam& b, const combination_result& r)
{
    const bool cantilever = b.layout == beam_layout::cantilever;
    o_ << "<table>\n<thead><tr><th>Result</th><th>Unit</th>" << (cantilever ? "" : "<th>Pinned</th>")
       << "<th>Range min</th><th>Range max</th><th>" << (cantilever ? "Rigid root" : "Fixed") << "</th></tr></thead>\n";
    const auto& f = result_fields();
    for (std::size_t i = 0; i < f.size(); ++i) {
        // A free tip has neither reaction nor moment: their rows are left out.
        if (cantilever && (f[i].member == &beam_state::reaction_end || f[i].member == &beam_state::moment_end)) continue;
        const bool position = f[i].member == &beam_state::max_sagging_at || f[i].member == &beam_state::max_hogging_at ||
                              f[i].member == &beam_state::max_deflection_at;
        auto cell = [&](double v) {
            return position ? format_number(std::abs(v) < 1e-12 ? 0.0 : u_.pos_in(v), 4) : u_.num(v, f[i].dim);
        };
        std::string label = f[i].label;
        while (!label.empty() && label.front() == ' ') label.erase(0, 1);
        o_ << "<tr><td>" << esc(label) << "</td><td>" << esc(position ? u_.pos_unit() : u_.sym(f[i].dim)) << "</td>"
           << (r.pinned ? "<td class=\"num\">" + cell((*r.pinned).*(f[i].member)) + "</td>" : std::string())
           << "<td class=\"num\">"
           << cell(r.envelope.ranges[i].min) << "</td><td class=\"num\">" << cell(r.envelope.ranges[i].max)
           << "</td><td class=\"num\">" << cell(r.fixed.*(f[i].member)) << "</td></tr>\n";
    }
    if (b.layout == beam_layout::overhang) tip_rows(r);
    if (r.frequency) frequency_rows(r, b.layout == beam_layout::two_supports);
    o_ << "</table>\n";
}

// An overhang's tip: deflection and rotation, pinned, over the range (the
// corners hold the extremes: linear in the start moment) and fixed.
void report_writer::tip_rows(const combination_result& r)
{
    const struct {
        const char* label;
        dimension dim;
        double beam_state::*member;
    } rows[] = {{"tip deflection (down +)", dims::length, &beam_state::tip_deflection},
                {"tip rotation (-dw/dx)", dims::angle, &beam_state::rotation_tip}};
    for (const auto& row : rows) {
        const value_range range = corner_range(r, row.member);
        const double lo = range.min, hi = range.max;
        o_ << "<tr><td>" << esc(row.label) << "</td><td>" << esc(u_.sym(row.dim)) << "</td>"
           << (r.pinned ? "<td class=\"num\">" + u_.num((*r.pinned).*(row.member), row.dim) + "</td>" : std::string())
           << "<td class=\"num\">" << u_.num(lo, row.dim) << "</td><td class=\"num\">" << u_.num(hi, row.dim)
           << "</td><td class=\"num\">" << u_.num(r.fixed.*(row.member), row.dim) << "</td></tr>\n";
    }
}

// A vibration combination: the first natural frequency of each state, and the
// 18/sqrt(delta) estimate from its deflection (model/natural_frequency.hpp).
void report_writer::frequency_rows(const combination_result& r, bool with_estimate)
{
    const auto& fr = *r.frequency;
    const auto row = [&](const std::string& label, const std::string (&cells)[4]) {
        o_ << "<tr><td>" << esc(label) << "</td><td>" << esc(u_.sym(dims::frequency)) << "</td>";
        for (std::size_t i = r.pinned ? 0 : 1; i < 4; ++i) o_ << "<td class=\"num\">" << cells[i] << "</td>";
        o_ << "</tr>\n";
    };
    const std::string exact[4] = {fr.pinned ? u_.num(*fr.pinned, dims::frequency) : std::string(),
                                  u_.num(fr.range.min, dims::frequency), u_.num(fr.range.max, dims::frequency),
                                  u_.num(fr.fixed, dims::frequency)};
    row("first natural frequency", exact);
    // The estimate belongs to a beam on two supports (natural_frequency.hpp).
    if (!r.pinned || !with_estimate) return;
    const auto estimate = [](double d) {
        return d > 0 ? format_number(frequency_from_deflection(d), 4) : std::string("-");
    };
    const auto& deflection = r.envelope.of(&beam_state::max_deflection);
    const std::string est[4] = {estimate(r.pinned->max_deflection), estimate(deflection.max), estimate(deflection.min),
                                estimate(r.fixed.max_deflection)};
    row("estimate 18/sqrt(delta mm)", est);
}

// Diagrams, pointwise over the span, from the same model the assessment used.
void report_writer::span_diagrams(const beam& b, const combination_result& r)
{
    const beam_model model(b.span, b.EI(), factored_loads(b.loads, r.comb), b.layout, b.overhang);
    const bool cantilever = b.layout == beam_layout::cantilever;
    const bool overhang = b.layout == beam_layout::overhang;
    const double length = model.length();  // an overhang: to its tip
    std::vector<double> xs;
    const int n = 160;
    for (int i = 0; i <= n; ++i) xs.push_back(length * i / n);
    for (double x : model.nodes()) xs.push_back(x);
    std::sort(xs.begin(), xs.end());
    xs.erase(std::unique(xs.begin(), xs.end(), [&](double a, double c) { return std::abs(a - c) < 1e-12 * b.span; }),
             xs.end());
    // Shear jumps at point loads: each interior node is also sampled just
    // before it, so that the diagram draws the jump as a vertical step.
    std::vector<double> xs_shear = xs;
    for (double x : model.nodes())
        if (x > 0 && x < length) xs_shear.push_back(x - 1e-9 * b.span);
    std::sort(xs_shear.begin(), xs_shear.end());
    enum class diagram { moment, shear, deflection };
    auto curves = [&](diagram kind) {
        const dimension d = kind == diagram::moment ? dims::moment : kind == diagram::shear ? dims::force : dims::length;
        auto value = [&](double x, const beam_state& s) {
            switch (kind) {
            case diagram::moment: return model.moment_at(x, s);
            case diagram::shear: return model.shear_at(x, s);
            case diagram::deflection: break;
            }
            return model.deflection_at(x, s);
        };
        // Deflection is drawn downward, as the beam deflects (sign_conventions.hpp).
        const double drawn = kind == diagram::deflection ? -1.0 : 1.0;
        const bool w = kind == diagram::deflection;
        chart_series pinned{overhang ? "pinned start" : "pinned ends", {}, chart_colour::pinned, true};
        chart_series fixed{cantilever ? "rigid root" : overhang ? "fixed start" : "fixed ends", {}, chart_colour::fixed,
                           true};
        chart_series lo{w ? "range envelope, least deflection" : "range envelope, min", {}, chart_colour::range_lower, false};
        chart_series hi{w ? "range envelope, most deflection" : "range envelope, max", {}, chart_colour::range_upper, false};
        for (double x : kind == diagram::shear ? xs_shear : xs) {
            const double px = u_.pos_in(x);
            if (r.pinned) pinned.points.emplace_back(px, drawn * u_.in(value(x, *r.pinned), d));
            fixed.points.emplace_back(px, drawn * u_.in(value(x, r.fixed), d));
            double mn = 0, mx = 0;
            for (std::size_t k = 0; k < r.corners.size(); ++k) {
                const double v = value(x, r.corners[k]);
                mn = k == 0 ? v : std::min(mn, v);
                mx = k == 0 ? v : std::max(mx, v);
            }
            lo.points.emplace_back(px, drawn * u_.in(mn, d));
            hi.points.emplace_back(px, drawn * u_.in(mx, d));
        }
        line_chart c;
        c.x.label = (cantilever  ? "x from the root, tip at the right ("
                     : overhang ? "x from the start support, end support at " + format_number(u_.pos_in(b.span), 4) +
                                      ", tip at the right ("
                                : "x from the start support (") +
                    u_.pos_unit() + ")";
        c.x.min = 0.0;
        c.x.max = u_.pos_in(length);
        c.series = {pinned, fixed, lo, hi};
        if (cantilever) c.series = {fixed, lo, hi};
        c.width = 760;
        c.height = 380;
        return c;
    };
    const std::string envelope =
        cantilever ? ": the rigid root, and the pointwise envelope over the root's stiffness range (the tip is free, "
                     "at the right)."
        : overhang ? ": a pinned and a fixed start, and the pointwise envelope over the start joint's stiffness range (the "
                     "beam continuous over the end support, the free tip at the right)."
                   : ": ideal pinned and fixed ends, and the pointwise envelope over the four corners of the stiffness range.";
    // A strength combination's moments and shears act on the members; a
    // service combination's deflection is what is checked.
    if (r.comb.use == limit_state::strength) {
        line_chart m = curves(diagram::moment);
        m.title = "Beam " + b.id + ", " + r.comb.name + ": bending moment";
        m.y.label = "M (" + u_.sym(dims::moment) + "), sagging +";
        figure("moment", to_svg(m), "Bending moment along the span, combination " + r.comb.name + envelope);
        line_chart v = curves(diagram::shear);
        v.title = "Beam " + b.id + ", " + r.comb.name + ": shear force";
        v.y.label = "V (" + u_.sym(dims::force) + "), V = dM/dx";
        figure("shear", to_svg(v),
               "Shear force along the span, combination " + r.comb.name +
                   (cantilever ? std::string(" (V = dM/dx: the root reaction at the root, zero at the free tip; a point "
                                             "load is a step)")
                    : overhang ? std::string(" (V = dM/dx: the start reaction at the start, a step of the end reaction "
                                             "at the end support, zero at the free tip; a point load is a step)")
                               : std::string(" (V = dM/dx: the start reaction at the start, minus the end reaction at "
                                             "the end; a point load is a step)")) +
                   envelope);
        return;
    }
    line_chart w = curves(diagram::deflection);
    w.title = "Beam " + b.id + ", " + r.comb.name + ": deflection";
    w.y.label = "-w (" + u_.sym(dims::length) + "): deflection drawn downward";
    figure("deflection", to_svg(w),
           "Deflection along the span, combination " + r.comb.name + ", drawn downward as the beam deflects" + envelope);
}

void report_writer::sweep_chart(const beam& b)
{
    if (b.combinations.empty()) return;
    sweep_settings settings;
    settings.combination = b.combinations.front().name;
    const sweep_result s = sweep_beam(p_, b, settings);
    // A cantilever's root, or an overhang's start joint, moves alone (threshold.hpp).
    const std::string what =
        b.layout == beam_layout::cantilever
            ? "The root from &kappa; = 0.01 (a pinned root is a mechanism) to rigid, combination " +
                  esc(settings.combination) + ": the tip's deflection and rotation divided by their values with a rigid root"
        : b.layout == beam_layout::overhang
            ? "The start joint from a true pin to rigid (an overhang has no end joint), combination " +
                  esc(settings.combination) +
                  ": each result divided by its value with a pinned start (end moments by their value with a fixed start)"
            : "Both joints together from a true pin to rigid, combination " + esc(settings.combination) +
                  ": each result divided by its value with pins (end moments by their value with fixed ends)";
    o_ << "<div class=\"keep\">\n<h3>Joint-stiffness sweep</h3>\n<p>" << what
       << " against &kappa; = S L / EI, with the code boundaries and the given stiffness range.</p>\n";
    figure("sweep", sweep_svg(p_, b, s),
           "Stiffness sweep of beam " + b.id + ", combination " + settings.combination +
               ": EN 1993-1-8 boundaries 0.5 and " + format_number(en_rigid_limit(p_.frame), 2) +
               ", AISC 360 boundaries 2 and 20.");
    o_ << "</div>\n";
}

// The beam lines: of the first strength combination (else the first) for a
// linear joint, of every strength combination for a joint with a law.
void report_writer::beam_lines(const beam& b)
{
    const combination* c = nullptr;
    for (const auto& x : b.combinations)
        if (!c && x.use == limit_state::strength) c = &x;
    if (!c && !b.combinations.empty()) c = &b.combinations.front();
    // A cantilever's root moment is fixed by statics: its beam line would be a horizontal line.
    if (c && b.layout == beam_layout::two_supports) {
        o_ << "<h3>Beam lines</h3>\n";
        for (beam_end e : {beam_end::start, beam_end::end}) {
            if (b.at(e).behaviour) law_beam_line_chart(b, e);
            else beam_line_chart(b, *c, e);
        }
    }
}

// The beam lines of a joint with a moment-rotation law, every strength
// combination in one chart (report/beam_line_chart.hpp).
void report_writer::law_beam_line_chart(const beam& b, beam_end e)
{
    const auto chart = joint_law_beam_lines(p_, b, e);
    if (!chart) {
        o_ << "<p>Beam line, " << to_string(e) << " end: no strength combination bends hogging moment into this "
           << "joint, so there is no beam line to draw.</p>\n";
        return;
    }
    figure("beam-line", to_svg(chart->chart), chart->caption);
}

void report_writer::beam_line_chart(const beam& b, const combination& c, beam_end e)
{
    const beam_line l = beam_line_of(b, c, e);
    const std::string end = to_string(e);
    if (l.fixed_moment == 0.0 || l.pinned_rotation == 0.0) {
        o_ << "<p>Beam line, " << end << " end: the combination bends no moment into a rigid joint here, so there "
           << "is no beam line to draw.</p>\n";
        return;
    }
    const dimension md = dims::moment;
    const double th_s = l.pinned_rotation * 1e3;  // mrad
    const double mf = u_.in(l.fixed_moment, md);
    line_chart ch;
    ch.title = "Beam " + b.id + ", " + c.name + ": beam line at the " + end + " joint";
    ch.x.label = "end rotation (mrad)";
    ch.y.label = "end moment (" + u_.sym(md) + "), hogging +";
    ch.width = 760;
    ch.height = 400;
    ch.series.push_back({"beam line", {{0.0, mf}, {th_s, 0.0}}, chart_colour::beam_line, false});
    auto joint_line = [&](const beam_line_point& pt, const std::string& name, const std::string& colour) {
        chart_series s{name + " = " + u_.stiff(pt.joint), {}, colour, true};
        if (pt.joint.is_rigid()) {
            s.points = {{0.0, 0.0}, {0.0, 1.1 * mf}};
        } else {
            const double k = u_.in(pt.joint.value(), md) / 1e3;  // per mrad
            double x1 = th_s;
            if (std::abs(k * x1) > std::abs(1.1 * mf)) x1 = 1.1 * mf / k;
            s.points = {{0.0, 0.0}, {x1, k * x1}};
        }
        ch.series.push_back(s);
    };
    joint_line(l.lower, "S min", chart_colour::range_lower);
    joint_line(l.upper, "S max", chart_colour::range_upper);
    // The intersections, each marked by a diamond in its joint line's colour.
    for (const auto* pt : {&l.lower, &l.upper}) {
        const double x = pt->rotation * 1e3, y = u_.in(pt->moment, md);
        chart_series s{(pt == &l.lower ? std::string("S min") : std::string("S max")) + " on the beam line: " +
                           format_number(x, 4) + " mrad, " + u_.q(pt->moment, md),
                       {{x, y}},
                       pt == &l.lower ? chart_colour::range_lower : chart_colour::range_upper,
                       false};
        s.marks_only = true;
        ch.series.push_back(s);
    }
    figure("beam-line", to_svg(ch),
           "Beam line at the " + end + " joint, combination " + c.name + ": M = M_F (1 - theta/theta_s) with M_F = " +
               u_.q(l.fixed_moment, md) + " (joint rigid) and theta_s = " + format_number(th_s, 4) +
               " mrad (joint pinned), the far joint held at its lower bound " + u_.stiff(l.far_end) +
               "; the joint lines M = S theta for the bounds of the stiffness range; the marked intersections are "
               "the analysed corner states.");
}

void report_writer::gap_drawings(const beam& b, const beam_assessment& ba)
{
    bool any = false;
    for (beam_end e : {beam_end::start, beam_end::end}) {
        const auto svg = gap_detail_svg(b, e, ba, u_.system);
        if (!svg) continue;
        if (!any) o_ << "<h3>Gap details</h3>\n";
        any = true;
        figure("gap-detail", *svg,
               "Elevation at the " + to_string(e) + " joint of beam " + b.id +
                   " at the worst-case gap, turned to the rotation demand (exaggerated as stated).");
    }
}

void report_writer::checks(const beam_assessment& ba)
{
    o_ << "<h3>Checks</h3>\n<table class=\"checks\">\n"
          "<thead><tr><th>Status</th><th>Check (reason below)</th><th>Value / limit</th></tr></thead>\n";
    for (const auto& c : ba.checks) {
        std::string vl;
        if (c.value) {
            const bool ratio = c.dim == dims::dimensionless;
            // Each quantity kept whole; the line may break at the slash.
            const auto whole = [](const std::string& t) { return "<span class=\"nw\">" + esc(t) + "</span>"; };
            vl = whole(ratio ? format_number(*c.value, 3) : u_.q(*c.value, c.dim));
            if (c.limit)
                vl += std::string(c.limit_is_minimum ? " / min " : " / ") +
                      whole(ratio ? format_number(*c.limit, 3) : u_.q(*c.limit, c.dim));
        }
        // Two rows per check, kept together on the page: status, id and
        // numbers, then the reason across the full width of the sheet.
        o_ << "<tbody class=\"check " << status_class(c.status) << "\"><tr class=\"" << status_class(c.status) << "\"><td class=\"status "
           << status_class(c.status) << "\" rowspan=\"2\">" << status_label(c.status) << "</td><td class=\"check-id\">"
           << esc(c.id) << "</td><td class=\"value\">" << vl << "</td></tr>\n<tr><td class=\"reason\" colspan=\"2\">"
           << esc(c.message) << "</td></tr></tbody>\n";
    }
    o_ << "</table>\n<p class=\"note\">Statuses: pass; FAIL (the assumption does not hold); warn (to pass on or to "
          "look at, does not change the verdict); n/a (not applicable, the reason is given).</p>\n";
}

void report_writer::verdict(const beam_assessment& ba)
{
    o_ << "<div class=\"verdict " << (ba.holds() ? "pass" : "fail") << "\">Verdict for beam " << esc(ba.id) << ": ";
    const std::string assumption = ba.input->layout == beam_layout::cantilever
                                       ? "the fixed-root assumption"
                                       : "the simple-support (pinned) assumption";
    if (ba.holds()) {
        o_ << assumption << " HOLDS; no check fails.";
    } else {
        std::string ids;
        int n = 0;
        for (const auto& c : ba.checks)
            if (c.status == check_status::fail) {
                ids += (ids.empty() ? "" : ", ") + c.id;
                ++n;
            }
        o_ << assumption << " DOES NOT HOLD. " << n << " check" << (n == 1 ? " fails" : "s fail")
           << ": " << esc(ids) << ".";
    }
    o_ << "</div>\n";
}

void report_writer::beam_section(const beam_assessment& ba)
{
    const beam& b = *ba.input;
    o_ << "<section class=\"beam\" id=\"beam-" << ++beams_ << "\">\n<h2>Beam " << esc(b.id) << "</h2>\n";
    verdict(ba);  // first, as a checker reads it; the checks below give the reasons
    inputs(b);
    if (b.layout == beam_layout::cantilever)
        figure("elevation", cantilever_elevation_svg(b, p_.units),
               "Elevation of cantilever " + b.id +
                   ": the root joint's spring at the supporting member on the left, the free tip on the right, the "
                   "unfactored loads by case (not to scale vertically).");
    else if (b.layout == beam_layout::overhang)
        figure("elevation", beam_elevation_svg(b, p_.units),
               "Elevation of overhang " + b.id +
                   ": the start joint as analysed on the left, the end support with the beam continuous over it, the "
                   "free tip on the right, the unfactored loads of every case drawn to scale within their kind, the "
                   "span L, the overhang a and the load positions from the start.");
    else
        figure("elevation", beam_elevation_svg(b, p_.units),
               "Beam " + b.id + " as analysed: each end drawn as its idealisation (pin, roller, rotational spring "
               "with its stiffness range, or fixed), the unfactored loads of every case drawn to scale within their "
               "kind, and the span and load positions.");
    joints(b, ba);
    connection_inputs(b);
    derived_joints(b);
    for (const auto& r : ba.combinations) combination_block(b, r);
    sweep_chart(b);
    beam_lines(b);
    gap_drawings(b, ba);
    checks(ba);
    o_ << "</section>\n";
}

void report_writer::closing()
{
    o_ << "<section id=\"references\">\n<h2>References</h2>\n<ol>\n"
          "<li>EN 1993-1-8:2005, Eurocode 3: Design of steel structures, Part 1-8: Design of joints, 5.2.2.5 "
          "(classification by stiffness).</li>\n"
          "<li>AISC 360-16, Specification for Structural Steel Buildings, Commentary B3.4 (connection "
          "classification by stiffness; rotation of simple connections).</li>\n"
          "<li>Monforton, G. R. and Wu, T. S. (1963), Matrix analysis of semi-rigidly connected frames, Journal of the "
          "Structural Division, ASCE, 89(ST6), paper 3713 (fixity factor).</li>\n"
          "<li>Young, W. C. and Budynas, R. G., Roark's Formulas for Stress and Strain, 7th ed., Table 8.1 (beams: "
          "end moments, rotations and deflections).</li>\n"
          "<li>Section tables: dimensions of the hot-rolled sections used (EN 10365:2017 for IPE and HE sections; "
          "AISC Steel Construction Manual Table 1-1 for W shapes); properties are computed from the dimensions, with root fillets.</li>\n"
          "</ol>\n</section>\n";
    o_ << "<section id=\"cautions\">\n<h2>Cautions</h2>\n<div class=\"caution\">" << esc(caution_text)
       << "</div>\n<ul>\n"
          "<li>For review by a qualified engineer; local codes and licensed practice govern.</li>\n"
          "<li>The results are only as good as the stiffness range given: the range should cover the uncertainty "
          "of the joint's stiffness (for AISC 360, its secant stiffness at service loads).</li>\n"
          "<li>The analysis is linear elastic; it does not include joint non-linearity beyond the given range, "
          "shear deformation, lateral-torsional buckling or the design of the beam, the joints or the supports.</li>\n"
          "</ul>\n</section>\n";
    o_ << "<footer class=\"note\"><p>pinproof " << esc(info_.version) << ", " << esc(info_.date) << ", input "
       << esc(info_.input_file) << " (SHA-256 <span class=\"hash\">" << esc(info_.input_sha256)
       << "</span>).</p></footer>\n</body>\n</html>\n";
}

std::string report_writer::write()
{
    head();
    title_block();
    method();
    for (const auto& ba : a_.beams) beam_section(ba);
    closing();
    return o_.str();
}

}  // namespace

// The drawing of a joint's gap detail at the worst-case gap, turned to the
// rotation demand of the gap check (the larger sense; the support's own
// rotation included), or to the largest end rotation when the detail was not
// assessed.
std::optional<std::string> gap_detail_svg(const beam& b, beam_end e, const beam_assessment& ba, unit_system units)
{
    const joint& j = b.at(e);
    if (!j.detail) return std::nullopt;
    double demand = 0;
    const auto& ja = ba.joint_at(e);
    if (ja.detail) {
        demand = ja.detail->demand_sagging >= ja.detail->demand_hogging ? ja.detail->demand_sagging
                                                                        : -ja.detail->demand_hogging;
    } else {
        double beam_state::*rot = e == beam_end::start ? &beam_state::rotation_start : &beam_state::rotation_end;
        for (const auto& r : ba.combinations) {
            const auto& range = r.envelope.of(rot);
            for (double v : {range.min, range.max})
                if (std::abs(v) > std::abs(demand)) demand = v;
        }
    }
    detail_drawing_options o;
    o.title = "Beam " + b.id + ", " + to_string(e) + " joint";
    o.mirror = e == beam_end::start;
    o.units = units;
    return detail_svg(build_geometry(*j.detail, b.sec), *j.detail, demand, o);
}


std::string calculation_report_html(const project& p, const project_assessment& a, const report_info& info)
{
    if (a.input != &p) throw internal_error("calculation report: the assessment is not of this project");
    return report_writer(p, a, info).write();
}

}  // namespace pinproof
