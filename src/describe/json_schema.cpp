#include "describe/json_schema.h"

#include <cstdio>
#include <vector>

namespace forme {

// A number as std::from_chars reads it (optional minus, digits with an
// optional point, optional exponent), then one of the four units; space is
// allowed around both, as parse_length trims it.
const char* const kLengthPattern =
    "^\\s*-?([0-9]+\\.?[0-9]*|\\.[0-9]+)([eE][+-]?[0-9]+)?\\s*(pt|mm|cm|in)\\s*$";

namespace {

/// JSON string literal per RFC 8259 §7: quote, backslash and control
/// characters escaped; other UTF-8 passes through unchanged.
std::string quoted(std::string_view s) {
  std::string out = "\"";
  for (char c : s) {
    switch (c) {
      case '"': out += "\\\""; break;
      case '\\': out += "\\\\"; break;
      case '\n': out += "\\n"; break;
      case '\t': out += "\\t"; break;
      case '\r': out += "\\r"; break;
      case '\b': out += "\\b"; break;
      case '\f': out += "\\f"; break;
      default:
        if (static_cast<unsigned char>(c) < 0x20) {
          char buf[8];
          std::snprintf(buf, sizeof buf, "\\u%04x", static_cast<unsigned>(static_cast<unsigned char>(c)));
          out += buf;
        } else {
          out += c;
        }
    }
  }
  return out + "\"";
}

/// A JSON object built member by member, kept in insertion order.
struct Object {
  std::vector<std::pair<std::string, std::string>> members;  // key, JSON value text
  void add(std::string_view key, std::string value) { members.emplace_back(std::string(key), std::move(value)); }
  std::string text(int indent) const {
    if (members.empty()) return "{}";
    const std::string pad(static_cast<std::size_t>(indent + 2), ' ');
    std::string out = "{\n";
    for (std::size_t i = 0; i < members.size(); ++i) {
      out += pad + quoted(members[i].first) + ": " + members[i].second;
      out += i + 1 < members.size() ? ",\n" : "\n";
    }
    return out + std::string(static_cast<std::size_t>(indent), ' ') + "}";
  }
};

std::string array(const std::vector<std::string>& items, int indent) {
  if (items.empty()) return "[]";
  const std::string pad(static_cast<std::size_t>(indent + 2), ' ');
  std::string out = "[\n";
  for (std::size_t i = 0; i < items.size(); ++i) out += pad + items[i] + (i + 1 < items.size() ? ",\n" : "\n");
  return out + std::string(static_cast<std::size_t>(indent), ' ') + "]";
}

std::string string_array(const std::vector<std::string_view>& items) {
  std::string out = "[";
  for (std::size_t i = 0; i < items.size(); ++i) out += (i ? ", " : "") + quoted(items[i]);
  return out + "]";
}

std::string node_schema(const NodeSpec& spec, std::string_view description, int indent);

// The three shapes a node may take; each adds its members to `o`.
void add_scalar(Object& o, const NodeSpec& spec) {
  switch (spec.scalar) {
    // The validator takes any YAML scalar as text, so numbers and true/false
    // written without quotes are text too (a year, a code).
    case ScalarType::text: o.add("type", string_array({"string", "number", "boolean"})); break;
    case ScalarType::integer: o.add("type", quoted("integer")); break;
    case ScalarType::number: o.add("type", quoted("number")); break;
    case ScalarType::length:
      o.add("type", quoted("string"));
      o.add("pattern", quoted(kLengthPattern));
      break;
    case ScalarType::boolean: o.add("type", quoted("boolean")); break;
    case ScalarType::choice: {
      // YAML reads true and false as booleans, so a choice that offers them
      // lists the JSON booleans too.
      std::string items = "[";
      for (std::size_t i = 0; i < spec.choices.size(); ++i) {
        const std::string_view c = spec.choices[i];
        items += (i ? ", " : "") + (c == "true" || c == "false" ? std::string(c) : quoted(c));
      }
      o.add("enum", items + "]");
      break;
    }
  }
}

std::string property_description(const KeySpec& ks) {
  const NodeSpec& v = *ks.value;
  std::string d(ks.doc.empty() ? v.doc : ks.doc);
  if (!v.refused.empty()) return (d.empty() ? std::string("not available") : d) + ". " + std::string(v.refused);
  if (d.empty()) return std::string(v.what);
  // The noun adds to the key's doc only where the shape is not obvious from
  // the schema itself: a length's form, or a choice between shapes.
  const int shapes = int(v.scalar_ok) + int(v.map_ok) + int(v.list_ok);
  if (shapes > 1 || (v.scalar_ok && v.scalar == ScalarType::length)) return d + " (" + std::string(v.what) + ")";
  return d;
}

void add_mapping(Object& o, const NodeSpec& spec, int indent) {
  o.add("type", quoted("object"));
  if (!spec.keys.empty()) {
    Object props;
    for (const auto& ks : spec.keys) props.add(ks.key, node_schema(*ks.value, property_description(ks), indent + 4));
    o.add("properties", props.text(indent + 2));
  }
  // Fixed keys refuse every other key; author-named keys (tables, filters)
  // take any name with the one value shape.
  o.add("additionalProperties", spec.any_key ? node_schema(*spec.any_key, spec.any_key->what, indent + 2) : "false");
  std::vector<std::string_view> required;
  for (const auto& ks : spec.keys)
    if (ks.required) required.push_back(ks.key);
  if (!required.empty()) o.add("required", string_array(required));
}

void add_list(Object& o, const NodeSpec& spec, int indent) {
  o.add("type", quoted("array"));
  if (spec.item) o.add("items", node_schema(*spec.item, spec.item->what, indent + 2));
}

enum class Shape { scalar, mapping, list };

void add_shape(Object& o, const NodeSpec& spec, Shape shape, int indent) {
  switch (shape) {
    case Shape::scalar: add_scalar(o, spec); break;
    case Shape::mapping: add_mapping(o, spec, indent); break;
    case Shape::list: add_list(o, spec, indent); break;
  }
}

/// Members of the schema for `spec`, after any already in `o`.
void add_node(Object& o, const NodeSpec& spec, int indent) {
  if (!spec.refused.empty()) {
    o.add("not", "{}");  // no value at all is accepted
    return;
  }
  std::vector<Shape> shapes;
  if (spec.scalar_ok) shapes.push_back(Shape::scalar);
  if (spec.map_ok) shapes.push_back(Shape::mapping);
  if (spec.list_ok) shapes.push_back(Shape::list);
  if (shapes.size() == 1) return add_shape(o, spec, shapes[0], indent);
  // Several shapes: the shapes' types are disjoint, so at most one matches.
  std::vector<std::string> alternatives;
  for (Shape s : shapes) {
    Object alt;
    add_shape(alt, spec, s, indent + 4);
    alternatives.push_back(alt.text(indent + 4));
  }
  o.add("anyOf", array(alternatives, indent + 2));
}

std::string node_schema(const NodeSpec& spec, std::string_view description, int indent) {
  Object o;
  if (!description.empty()) o.add("description", quoted(description));
  add_node(o, spec, indent);
  return o.text(indent);
}

}  // namespace

std::string json_schema_text(const NodeSpec& root) {
  Object o;
  o.add("$schema", quoted("https://json-schema.org/draft/2020-12/schema"));
  o.add("title", quoted("forme page description"));
  o.add("description", quoted(root.doc.empty() ? root.what : root.doc));
  add_node(o, root, 0);
  return o.text(0) + "\n";
}

}  // namespace forme
