#include "pinproof/model/section.hpp"

#include "pinproof/core/edit_distance.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>
#include <stdexcept>
#include <string>
#include <system_error>
#include <unordered_map>
#include <utility>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "model/section_catalogue_data.hpp"

namespace pinproof {
namespace {

constexpr double pi = 3.14159265358979323846;

// Geometry of one root fillet: the region between the web face, the inner
// flange face and a circular arc of radius r tangent to both, i.e. an r x r
// square minus a quarter disc. Local coordinate s measured from the inner
// flange face towards the neutral axis.
//   area        Af = r^2 - pi r^2/4 = (1 - pi/4) r^2
//   first moment about the flange face
//               Sf = r^3/2 - (pi r^3/4 - r^3/3) = (5/6 - pi/4) r^3
//   centroid    s_c = Sf/Af = r (10 - 3 pi)/(12 - 3 pi)
//   second moment about the flange face
//               r^4/3 - (5 pi/16 - 2/3) r^4 = (1 - 5 pi/16) r^4
//   own centroidal term (parallel axis theorem)
//               If = (1 - 5 pi/16) r^4 - Af s_c^2 = 0.0075451 r^4
// The square's terms are elementary; the quarter disc's follow from its
// area pi r^2/4, first moment r^3/3 and second moment pi r^4/16 about a
// bounding radius (elementary geometry; common practice, no source).
// Numerically: Af = 0.21460 r^2, s_c = 0.22337 r, If = 0.0075451 r^4.
struct fillet_terms {
    double area;
    double centroid;     // from the inner flange face
    double own_inertia;  // about its own centroid, parallel to the flanges
};

fillet_terms root_fillet(double r)
{
    const double area = (1.0 - pi / 4.0) * r * r;
    const double centroid = r * (10.0 - 3.0 * pi) / (12.0 - 3.0 * pi);
    const double own_inertia = (1.0 - 5.0 * pi / 16.0) * r * r * r * r - area * centroid * centroid;
    return {area, centroid, own_inertia};
}

void require(bool ok, const std::string& name, const std::string& message)
{
    if (!ok) {
        throw std::invalid_argument("section '" + name + "': " + message);
    }
}

std::string mm_text(double metres)
{
    std::string s = std::to_string(metres * 1e3);
    // std::to_string gives six decimals; trim trailing zeros for readability.
    while (!s.empty() && s.back() == '0') s.pop_back();
    if (!s.empty() && s.back() == '.') s.pop_back();
    return s + " mm";
}

void validate(const section_dimensions& d)
{
    const std::string& n = d.name;
    auto finite_positive = [&](double v, const char* field) {
        require(std::isfinite(v) && v > 0.0, n,
                std::string(field) + " must be a positive length, found " +
                    (std::isfinite(v) ? mm_text(v) : std::string("a non-finite value")));
    };
    finite_positive(d.h, "depth h");
    finite_positive(d.b, "flange width b");
    finite_positive(d.tw, "web thickness tw");
    finite_positive(d.tf, "flange thickness tf");
    require(std::isfinite(d.r) && d.r >= 0.0, n,
            "root radius r must be zero or a positive length, found " +
                (std::isfinite(d.r) ? mm_text(d.r) : std::string("a non-finite value")));
    require(d.tw < d.b, n,
            "web thickness tw (" + mm_text(d.tw) + ") must be less than flange width b (" +
                mm_text(d.b) + ")");
    require(2.0 * d.tf < d.h, n,
            "two flange thicknesses 2*tf (" + mm_text(2.0 * d.tf) + ") must be less than depth h (" +
                mm_text(d.h) + ")");
    // The fillets must fit: beside the web within the flange outstand, and
    // within the clear web height between the flanges.
    require(d.tw + 2.0 * d.r <= d.b, n,
            "tw + 2*r (" + mm_text(d.tw + 2.0 * d.r) + ") must not exceed flange width b (" +
                mm_text(d.b) + ")");
    require(2.0 * (d.tf + d.r) <= d.h, n,
            "2*(tf + r) (" + mm_text(2.0 * (d.tf + d.r)) + ") must not exceed depth h (" +
                mm_text(d.h) + ")");
}

// ---- catalogue text ---------------------------------------------------------

constexpr std::string_view expected_header = "name,unit,h,b,tw,tf,r";
// The same with the tabulated properties, each optional on a row.
constexpr std::string_view tabulated_header = "name,unit,h,b,tw,tf,r,A,I,W_el,W_pl";

[[noreturn]] void catalogue_fault(std::size_t line, std::size_t column, const std::string& message)
{
    throw internal_error("section catalogue, line " + std::to_string(line) + ", column " +
                         std::to_string(column) + ": " + message);
}

std::string_view trim(std::string_view s)
{
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    return s;
}

std::vector<std::string_view> split_fields(std::string_view line)
{
    std::vector<std::string_view> fields;
    std::size_t start = 0;
    for (;;) {
        const std::size_t comma = line.find(',', start);
        fields.push_back(trim(line.substr(start, comma == std::string_view::npos ? std::string_view::npos
                                                                               : comma - start)));
        if (comma == std::string_view::npos) break;
        start = comma + 1;
    }
    return fields;
}

// Uppercase, spaces removed, HE series written as HE<size><A|B>, so that
// "HEA 300", "HE 300 A" and "he300a" compare equal.
std::string lookup_key(std::string_view name)
{
    std::string k;
    for (char c : name) {
        if (std::isspace(static_cast<unsigned char>(c))) continue;
        k += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    }
    if (k.size() > 3 && k.compare(0, 2, "HE") == 0 && (k[2] == 'A' || k[2] == 'B')) {
        bool digits = true;
        for (std::size_t i = 3; i < k.size(); ++i) digits = digits && std::isdigit(static_cast<unsigned char>(k[i]));
        if (digits) k = "HE" + k.substr(3) + k[2];
    }
    return k;
}

const std::vector<section_dimensions>& parsed_catalogue()
{
    // Function-local static: initialised once, thread-safe since C++11.
    static const std::vector<section_dimensions> rows =
        detail::parse_section_catalogue(detail::section_catalogue_csv);
    return rows;
}

}  // namespace

namespace detail {

std::vector<section_dimensions> parse_section_catalogue(std::string_view text)
{
    std::vector<section_dimensions> rows;
    std::vector<std::string> keys;
    bool header_seen = false;
    bool with_tabulated = false;
    std::size_t line_no = 0;
    std::size_t pos = 0;
    while (pos < text.size()) {
        const std::size_t eol = text.find('\n', pos);
        std::string_view raw = text.substr(pos, eol == std::string_view::npos ? std::string_view::npos : eol - pos);
        pos = (eol == std::string_view::npos) ? text.size() : eol + 1;
        ++line_no;
        const std::string_view line = trim(raw);
        if (line.empty() || line.front() == '#') continue;

        if (!header_seen) {
            if (line != expected_header && line != tabulated_header) {
                catalogue_fault(line_no, 1, "expected the header '" + std::string(expected_header) + "' or '" +
                                                std::string(tabulated_header) + "', found '" + std::string(line) + "'");
            }
            header_seen = true;
            with_tabulated = line == tabulated_header;
            continue;
        }

        const auto fields = split_fields(line);
        if (fields.size() != 7 && !(with_tabulated && fields.size() == 11)) {
            catalogue_fault(line_no, 1, "expected 7 fields (" + std::string(expected_header) + ")" +
                                            (with_tabulated ? " or 11 (" + std::string(tabulated_header) + ")" : "") +
                                            ", found " + std::to_string(fields.size()));
        }
        section_dimensions d;
        d.name = std::string(fields[0]);
        if (d.name.empty()) catalogue_fault(line_no, 1, "expected a section name, found an empty field");

        double scale = 0.0;
        if (fields[1] == "mm") {
            scale = 1e-3;
        } else if (fields[1] == "in") {
            scale = 0.0254;  // exact by definition of the international inch
        } else {
            catalogue_fault(line_no, 2, "expected unit 'mm' or 'in', found '" + std::string(fields[1]) + "'");
        }

        double* targets[5] = {&d.h, &d.b, &d.tw, &d.tf, &d.r};
        for (std::size_t i = 0; i < 5; ++i) {
            const std::string_view f = fields[2 + i];
            double v = 0.0;
            const auto res = std::from_chars(f.data(), f.data() + f.size(), v);
            if (f.empty() || res.ec != std::errc() || res.ptr != f.data() + f.size() || !std::isfinite(v) ||
                v <= 0.0) {
                catalogue_fault(line_no, 3 + i,
                                "expected a positive number for " + std::string(split_fields(expected_header)[2 + i]) +
                                    ", found '" + std::string(f) + "'");
            }
            *targets[i] = v * scale;
        }
        // Tabulated properties, in the table's units: cm2, cm4, cm3 on a "mm"
        // row, in2, in4, in3 on an "in" row. An empty field is computed.
        std::optional<double>* tabulated[4] = {&d.A, &d.I, &d.W_el, &d.W_pl};
        const double length = fields[1] == "mm" ? 1e-2 : 0.0254;
        const int power[4] = {2, 4, 3, 3};
        for (std::size_t i = 0; fields.size() == 11 && i < 4; ++i) {
            const std::string_view f = fields[7 + i];
            if (f.empty()) continue;
            double v = 0.0;
            const auto res = std::from_chars(f.data(), f.data() + f.size(), v);
            if (res.ec != std::errc() || res.ptr != f.data() + f.size() || !std::isfinite(v) || v <= 0.0)
                catalogue_fault(line_no, 8 + i,
                                "expected a positive number or nothing for " +
                                    std::string(split_fields(tabulated_header)[7 + i]) + ", found '" + std::string(f) + "'");
            *tabulated[i] = v * std::pow(length, power[i]);
        }
        try {
            validate(d);
        } catch (const std::invalid_argument& e) {
            catalogue_fault(line_no, 1, e.what());
        }
        std::string key = lookup_key(d.name);
        for (const auto& k : keys) {
            if (k == key) catalogue_fault(line_no, 1, "section '" + d.name + "' is listed twice");
        }
        keys.push_back(std::move(key));
        rows.push_back(std::move(d));
    }
    if (!header_seen) catalogue_fault(line_no, 1, "no header line found");
    return rows;
}

}  // namespace detail

// Closed forms for a doubly symmetric I section with four root fillets:
// flanges and web as rectangles, plus four fillets each with the terms of
// root_fillet() (common practice, no source; the tests check the results
// against EN 10365:2017 and AISC Manual Table 1-1 values and against an
// independent integration). With e = h/2 - tf - s_c the distance of a
// fillet centroid from the major axis:
//   A     = 2 b tf + (h - 2 tf) tw + 4 Af            (4 Af = (4 - pi) r^2)
//   Iy    = [b h^3 - (b - tw)(h - 2 tf)^3]/12 + 4 (If + Af e^2)
//   Wel,y = Iy / (h/2)
//   Wpl,y = 2 x first moment of the half section about the major axis
//         = b tf (h - tf) + tw (h - 2 tf)^2/4 + 4 Af e
section rolled_i_section(const section_dimensions& d)
{
    validate(d);
    const fillet_terms f = root_fillet(d.r);
    const double hw = d.h - 2.0 * d.tf;  // clear height between the flanges
    const double e = d.h / 2.0 - d.tf - f.centroid;

    section s;
    s.name = d.name;
    s.depth = d.h;
    s.area = 2.0 * d.b * d.tf + hw * d.tw + 4.0 * f.area;
    s.I = (d.b * d.h * d.h * d.h - (d.b - d.tw) * hw * hw * hw) / 12.0 + 4.0 * (f.own_inertia + f.area * e * e);
    s.W_el = s.I / (d.h / 2.0);
    s.W_pl = d.b * d.tf * (d.h - d.tf) + d.tw * hw * hw / 4.0 + 4.0 * f.area * e;
    s.flange_width = d.b;
    s.flange_thickness = d.tf;
    s.web_thickness = d.tw;
    s.root_radius = d.r;

    if (!(std::isfinite(s.I) && s.I > 0.0 && std::isfinite(*s.area) && *s.area > 0.0 && std::isfinite(*s.W_pl) &&
          *s.W_pl > 0.0)) {
        throw internal_error("section '" + d.name + "': computed properties are not positive and finite");
    }
    return s;
}

section catalogue_section(const section_dimensions& d)
{
    section s = rolled_i_section(d);
    if (d.A) s.area = *d.A;
    if (d.I) s.I = *d.I;
    if (d.W_el) s.W_el = *d.W_el;
    if (d.W_pl) s.W_pl = *d.W_pl;
    return s;
}

namespace {

// Every catalogue section's matching key, formed once, beside its dimensions.
// Its properties are computed when a name first asks for them, once per
// thread: a project names a few sections of several hundred, and a schedule
// looks up a few names many times.
struct indexed_section {
    std::string key;
    const section_dimensions* dimensions = nullptr;
};

const std::vector<indexed_section>& catalogue_index()
{
    static const std::vector<indexed_section> index = [] {
        std::vector<indexed_section> out;
        for (const auto& d : parsed_catalogue()) out.push_back({lookup_key(d.name), &d});
        return out;
    }();
    return index;
}

}  // namespace

std::optional<section> find_catalogue_section(std::string_view name)
{
    const std::string key = lookup_key(name);
    if (key.empty()) return std::nullopt;
    const auto& index = catalogue_index();
    for (std::size_t i = 0; i < index.size(); ++i) {
        if (index[i].key != key) continue;
        thread_local std::unordered_map<std::size_t, section> computed;
        auto it = computed.find(i);
        if (it == computed.end()) it = computed.emplace(i, catalogue_section(*index[i].dimensions)).first;
        return it->second;
    }
    return std::nullopt;
}

std::vector<std::string> similar_catalogue_sections(std::string_view name, std::size_t most)
{
    const std::string key = lookup_key(name);
    if (key.empty() || most == 0) return {};
    std::vector<std::pair<std::size_t, const indexed_section*>> near;
    for (const auto& i : catalogue_index()) {
        const std::size_t d = edit_distance(key, i.key);
        if (d <= 2) near.emplace_back(d, &i);
    }
    // Only the nearest: a name one edit away is not listed beside names two away.
    std::size_t best = 3;
    for (const auto& n : near) best = std::min(best, n.first);
    std::vector<std::string> out;
    for (const auto& [d, i] : near) {
        if (out.size() == most) break;
        if (d == best) out.push_back(i->dimensions->name);
    }
    return out;
}

std::string unknown_section_text(std::string_view name)
{
    std::string out = "found \"" + std::string(name) + "\"";
    const auto similar = similar_catalogue_sections(name);
    for (std::size_t i = 0; i < similar.size(); ++i)
        out += (i == 0 ? "; did you mean \"" : i + 1 == similar.size() ? " or \"" : ", \"") + similar[i] + "\"";
    if (!similar.empty()) out += "?";
    return out;
}

const std::vector<section_dimensions>& catalogue()
{
    return parsed_catalogue();
}

}  // namespace pinproof
