#include "model/detail_key.hpp"

namespace pinproof {

std::string detail_key(const connection_detail& d, const section& beam)
{
    // The bytes of every value, so that two keys are equal only for
    // bit-identical inputs. Each optional part is preceded by a presence byte
    // and each name and list by its length, so that no two inputs give the same bytes.
    std::string key;
    key.reserve(512);
    const auto put = [&](double v) { key.append(reinterpret_cast<const char*>(&v), sizeof v); };
    const auto put_int = [&](long v) { key.append(reinterpret_cast<const char*>(&v), sizeof v); };
    const auto put_name = [&](const std::string& n) {
        put_int(static_cast<long>(n.size()));
        key += n;
    };
    const auto present = [&](bool p) {
        key += p ? '1' : '0';
        return p;
    };
    const auto put_opt = [&](const std::optional<double>& v) {
        if (present(v.has_value())) put(*v);
    };
    for (long v : {static_cast<long>(d.type), static_cast<long>(d.support), static_cast<long>(d.grade),
                   static_cast<long>(d.bolts.rows), static_cast<long>(d.gap_tolerance_given)})
        put_int(v);
    for (double v : {d.gap, d.gap_tolerance, d.plate_top, d.plate_depth, d.plate_thickness, d.bolts.diameter,
                     d.bolts.hole_diameter, d.bolts.pitch, d.bolts.first_bolt, d.bolts.bolt_line})
        put(v);
    for (const auto* c : {&d.cope_top, &d.cope_bottom}) {
        if (present(c->has_value())) {
            put((*c)->depth);
            put((*c)->length);
        }
    }
    if (present(d.support_beam.has_value())) {
        const auto& sb = *d.support_beam;
        put_name(sb.name);
        for (double v : {sb.top, sb.depth, sb.flange_width, sb.flange_thickness, sb.web_thickness, sb.root_radius}) put(v);
    }
    if (present(d.centre_of_rotation.has_value())) {
        put(d.centre_of_rotation->from_support);
        put(d.centre_of_rotation->below_top);
    }
    {
        const derivation_fields& f = d.derivation;
        if (present(f.bolt_grade.has_value())) put_name(*f.bolt_grade);
        if (present(f.threads_in_shear_plane.has_value())) key += *f.threads_in_shear_plane ? '1' : '0';
        if (present(f.weld.has_value())) {
            put(f.weld->size);
            key += f.weld->leg ? '1' : '0';
        }
        for (const auto* v : {&f.edge_distance, &f.gauge, &f.plate_width}) put_opt(*v);
    }
    put_int(static_cast<long>(d.outline.size()));
    for (const auto& pt : d.outline) {
        put(pt.from_support);
        put(pt.below_top);
    }
    put_name(beam.name);
    put(beam.I);
    put(beam.depth);
    for (const auto* v : {&beam.area, &beam.flange_width, &beam.flange_thickness, &beam.web_thickness, &beam.root_radius,
                          &beam.W_el, &beam.W_pl})
        put_opt(*v);
    return key;
}

}  // namespace pinproof
