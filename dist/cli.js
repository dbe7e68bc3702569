#!/usr/bin/env node
import { createRequire as __skillgateCreateRequire } from 'node:module';
const require = __skillgateCreateRequire(import.meta.url);
var __create = Object.create;
var __defProp = Object.defineProperty;
var __getOwnPropDesc = Object.getOwnPropertyDescriptor;
var __getOwnPropNames = Object.getOwnPropertyNames;
var __getProtoOf = Object.getPrototypeOf;
var __hasOwnProp = Object.prototype.hasOwnProperty;
var __require = /* @__PURE__ */ ((x) => typeof require !== "undefined" ? require : typeof Proxy !== "undefined" ? new Proxy(x, {
  get: (a, b) => (typeof require !== "undefined" ? require : a)[b]
}) : x)(function(x) {
  if (typeof require !== "undefined") return require.apply(this, arguments);
  throw Error('Dynamic require of "' + x + '" is not supported');
});
var __commonJS = (cb, mod) => function __require2() {
  try {
    return mod || (0, cb[__getOwnPropNames(cb)[0]])((mod = { exports: {} }).exports, mod), mod.exports;
  } catch (e) {
    throw mod = 0, e;
  }
};
var __copyProps = (to, from, except, desc) => {
  if (from && typeof from === "object" || typeof from === "function") {
    for (let key of __getOwnPropNames(from))
      if (!__hasOwnProp.call(to, key) && key !== except)
        __defProp(to, key, { get: () => from[key], enumerable: !(desc = __getOwnPropDesc(from, key)) || desc.enumerable });
  }
  return to;
};
var __toESM = (mod, isNodeMode, target) => (target = mod != null ? __create(__getProtoOf(mod)) : {}, __copyProps(
  // If the importer is in node compatibility mode or this is not an ESM
  // file that has been converted to a CommonJS file using a Babel-
  // compatible transform (i.e. "__esModule" has not been set), then set
  // "default" to the CommonJS "module.exports" for node compatibility.
  isNodeMode || !mod || !mod.__esModule ? __defProp(target, "default", { value: mod, enumerable: true }) : target,
  mod
));

// node_modules/@stdlib/utils-define-property/lib/define_property.js
var require_define_property = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/define_property.js"(exports, module) {
    "use strict";
    var main2 = typeof Object.defineProperty === "function" ? Object.defineProperty : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-define-property/lib/has_define_property_support.js
var require_has_define_property_support = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/has_define_property_support.js"(exports, module) {
    "use strict";
    var defineProperty = require_define_property();
    function hasDefinePropertySupport() {
      try {
        defineProperty({}, "x", {});
        return true;
      } catch (err) {
        return false;
      }
    }
    module.exports = hasDefinePropertySupport;
  }
});

// node_modules/@stdlib/utils-define-property/lib/builtin.js
var require_builtin = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/builtin.js"(exports, module) {
    "use strict";
    var defineProperty = Object.defineProperty;
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/is_number.js
var require_is_number = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/is_number.js"(exports, module) {
    "use strict";
    function isNumber(value) {
      return typeof value === "number";
    }
    module.exports = isNumber;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/zero_pad.js
var require_zero_pad = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/zero_pad.js"(exports, module) {
    "use strict";
    function startsWithMinus(str) {
      return str[0] === "-";
    }
    function zeros(n) {
      var out = "";
      var i;
      for (i = 0; i < n; i++) {
        out += "0";
      }
      return out;
    }
    function zeroPad(str, width, right) {
      var negative = false;
      var pad = width - str.length;
      if (pad < 0) {
        return str;
      }
      if (startsWithMinus(str)) {
        negative = true;
        str = str.substr(1);
      }
      str = right ? str + zeros(pad) : zeros(pad) + str;
      if (negative) {
        str = "-" + str;
      }
      return str;
    }
    module.exports = zeroPad;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/format_integer.js
var require_format_integer = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/format_integer.js"(exports, module) {
    "use strict";
    var isNumber = require_is_number();
    var zeroPad = require_zero_pad();
    var lowercase = String.prototype.toLowerCase;
    var uppercase = String.prototype.toUpperCase;
    function formatInteger(token) {
      var base;
      var out;
      var i;
      switch (token.specifier) {
        case "b":
          base = 2;
          break;
        case "o":
          base = 8;
          break;
        case "x":
        case "X":
          base = 16;
          break;
        case "d":
        case "i":
        case "u":
        default:
          base = 10;
          break;
      }
      out = token.arg;
      i = parseInt(out, 10);
      if (!isFinite(i)) {
        if (!isNumber(out)) {
          throw new Error("invalid integer. Value: " + out);
        }
        i = 0;
      }
      if (i < 0 && (token.specifier === "u" || base !== 10)) {
        i = 4294967295 + i + 1;
      }
      if (i < 0) {
        out = (-i).toString(base);
        if (token.precision) {
          out = zeroPad(out, token.precision, token.padRight);
        }
        out = "-" + out;
      } else {
        out = i.toString(base);
        if (!i && !token.precision) {
          out = "";
        } else if (token.precision) {
          out = zeroPad(out, token.precision, token.padRight);
        }
        if (token.sign) {
          out = token.sign + out;
        }
      }
      if (base === 16) {
        if (token.alternate) {
          out = "0x" + out;
        }
        out = token.specifier === uppercase.call(token.specifier) ? uppercase.call(out) : lowercase.call(out);
      }
      if (base === 8) {
        if (token.alternate && out.charAt(0) !== "0") {
          out = "0" + out;
        }
      }
      return out;
    }
    module.exports = formatInteger;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/is_string.js
var require_is_string = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/is_string.js"(exports, module) {
    "use strict";
    function isString(value) {
      return typeof value === "string";
    }
    module.exports = isString;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/format_double.js
var require_format_double = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/format_double.js"(exports, module) {
    "use strict";
    var abs = Math.abs;
    var lowercase = String.prototype.toLowerCase;
    var uppercase = String.prototype.toUpperCase;
    var replace = String.prototype.replace;
    var RE_EXP_POS_DIGITS = /e\+(\d)$/;
    var RE_EXP_NEG_DIGITS = /e-(\d)$/;
    var RE_ONLY_DIGITS = /^(\d+)$/;
    var RE_DIGITS_BEFORE_EXP = /^(\d+)e/;
    var RE_TRAILING_PERIOD_ZERO = /\.0$/;
    var RE_PERIOD_ZERO_EXP = /\.0*e/;
    var RE_ZERO_BEFORE_EXP = /(\..*[^0])0*e/;
    function formatDouble(f, token) {
      var digits;
      var out;
      switch (token.specifier) {
        case "e":
        case "E":
          out = f.toExponential(token.precision);
          break;
        case "f":
        case "F":
          out = f.toFixed(token.precision);
          break;
        case "g":
        case "G":
          if (abs(f) < 1e-4) {
            digits = token.precision;
            if (digits > 0) {
              digits -= 1;
            }
            out = f.toExponential(digits);
          } else {
            out = f.toPrecision(token.precision);
          }
          if (!token.alternate) {
            out = replace.call(out, RE_ZERO_BEFORE_EXP, "$1e");
            out = replace.call(out, RE_PERIOD_ZERO_EXP, "e");
            out = replace.call(out, RE_TRAILING_PERIOD_ZERO, "");
          }
          break;
        default:
          throw new Error("invalid double notation. Value: " + token.specifier);
      }
      out = replace.call(out, RE_EXP_POS_DIGITS, "e+0$1");
      out = replace.call(out, RE_EXP_NEG_DIGITS, "e-0$1");
      if (token.alternate) {
        out = replace.call(out, RE_ONLY_DIGITS, "$1.");
        out = replace.call(out, RE_DIGITS_BEFORE_EXP, "$1.e");
      }
      if (f >= 0 && token.sign) {
        out = token.sign + out;
      }
      out = token.specifier === uppercase.call(token.specifier) ? uppercase.call(out) : lowercase.call(out);
      return out;
    }
    module.exports = formatDouble;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/space_pad.js
var require_space_pad = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/space_pad.js"(exports, module) {
    "use strict";
    function spaces(n) {
      var out = "";
      var i;
      for (i = 0; i < n; i++) {
        out += " ";
      }
      return out;
    }
    function spacePad(str, width, right) {
      var pad = width - str.length;
      if (pad < 0) {
        return str;
      }
      str = right ? str + spaces(pad) : spaces(pad) + str;
      return str;
    }
    module.exports = spacePad;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/main.js
var require_main = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/main.js"(exports, module) {
    "use strict";
    var formatInteger = require_format_integer();
    var isString = require_is_string();
    var isNumber = require_is_number();
    var formatDouble = require_format_double();
    var spacePad = require_space_pad();
    var zeroPad = require_zero_pad();
    var fromCharCode = String.fromCharCode;
    var isArray = Array.isArray;
    function isnan(value) {
      return value !== value;
    }
    function initialize(token) {
      var out = {};
      out.specifier = token.specifier;
      out.precision = token.precision === void 0 ? 1 : token.precision;
      out.width = token.width;
      out.flags = token.flags || "";
      out.mapping = token.mapping;
      return out;
    }
    function formatInterpolate(tokens) {
      var hasPeriod;
      var flags;
      var token;
      var flag;
      var num;
      var out;
      var pos;
      var f;
      var i;
      var j;
      if (!isArray(tokens)) {
        throw new TypeError("invalid argument. First argument must be an array. Value: `" + tokens + "`.");
      }
      out = "";
      pos = 1;
      for (i = 0; i < tokens.length; i++) {
        token = tokens[i];
        if (isString(token)) {
          out += token;
        } else {
          hasPeriod = token.precision !== void 0;
          token = initialize(token);
          if (!token.specifier) {
            throw new TypeError("invalid argument. Token is missing `specifier` property. Index: `" + i + "`. Value: `" + token + "`.");
          }
          if (token.mapping) {
            pos = token.mapping;
          }
          flags = token.flags;
          for (j = 0; j < flags.length; j++) {
            flag = flags.charAt(j);
            switch (flag) {
              case " ":
                token.sign = " ";
                break;
              case "+":
                token.sign = "+";
                break;
              case "-":
                token.padRight = true;
                token.padZeros = false;
                break;
              case "0":
                token.padZeros = flags.indexOf("-") < 0;
                break;
              case "#":
                token.alternate = true;
                break;
              default:
                throw new Error("invalid flag: " + flag);
            }
          }
          if (token.width === "*") {
            token.width = parseInt(arguments[pos], 10);
            pos += 1;
            if (isnan(token.width)) {
              throw new TypeError("the argument for * width at position " + pos + " is not a number. Value: `" + token.width + "`.");
            }
            if (token.width < 0) {
              token.padRight = true;
              token.width = -token.width;
            }
          }
          if (hasPeriod) {
            if (token.precision === "*") {
              token.precision = parseInt(arguments[pos], 10);
              pos += 1;
              if (isnan(token.precision)) {
                throw new TypeError("the argument for * precision at position " + pos + " is not a number. Value: `" + token.precision + "`.");
              }
              if (token.precision < 0) {
                token.precision = 1;
                hasPeriod = false;
              }
            }
          }
          token.arg = arguments[pos];
          switch (token.specifier) {
            case "b":
            case "o":
            case "x":
            case "X":
            case "d":
            case "i":
            case "u":
              if (hasPeriod) {
                token.padZeros = false;
              }
              token.arg = formatInteger(token);
              break;
            case "s":
              token.maxWidth = hasPeriod ? token.precision : -1;
              token.arg = String(token.arg);
              break;
            case "c":
              if (!isnan(token.arg)) {
                num = parseInt(token.arg, 10);
                if (num < 0 || num > 127) {
                  throw new Error("invalid character code. Value: " + token.arg);
                }
                token.arg = isnan(num) ? String(token.arg) : fromCharCode(num);
              }
              break;
            case "e":
            case "E":
            case "f":
            case "F":
            case "g":
            case "G":
              if (!hasPeriod) {
                token.precision = 6;
              }
              f = parseFloat(token.arg);
              if (!isFinite(f)) {
                if (!isNumber(token.arg)) {
                  throw new Error("invalid floating-point number. Value: " + out);
                }
                f = token.arg;
                token.padZeros = false;
              }
              token.arg = formatDouble(f, token);
              break;
            default:
              throw new Error("invalid specifier: " + token.specifier);
          }
          if (token.maxWidth >= 0 && token.arg.length > token.maxWidth) {
            token.arg = token.arg.substring(0, token.maxWidth);
          }
          if (token.padZeros) {
            token.arg = zeroPad(token.arg, token.width || token.precision, token.padRight);
          } else if (token.width) {
            token.arg = spacePad(token.arg, token.width, token.padRight);
          }
          out += token.arg || "";
          pos += 1;
        }
      }
      return out;
    }
    module.exports = formatInterpolate;
  }
});

// node_modules/@stdlib/string-base-format-interpolate/lib/index.js
var require_lib = __commonJS({
  "node_modules/@stdlib/string-base-format-interpolate/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main();
    module.exports = main2;
  }
});

// node_modules/@stdlib/string-base-format-tokenize/lib/main.js
var require_main2 = __commonJS({
  "node_modules/@stdlib/string-base-format-tokenize/lib/main.js"(exports, module) {
    "use strict";
    var RE = /%(?:([1-9]\d*)\$)?([0 +\-#]*)(\*|\d+)?(?:(\.)(\*|\d+)?)?[hlL]?([%A-Za-z])/g;
    function parse(match) {
      var token = {
        "mapping": match[1] ? parseInt(match[1], 10) : void 0,
        "flags": match[2],
        "width": match[3],
        "precision": match[5],
        "specifier": match[6]
      };
      if (match[4] === "." && match[5] === void 0) {
        token.precision = "1";
      }
      return token;
    }
    function formatTokenize(str) {
      var content;
      var tokens;
      var match;
      var prev;
      tokens = [];
      prev = 0;
      match = RE.exec(str);
      while (match) {
        content = str.slice(prev, RE.lastIndex - match[0].length);
        if (content.length) {
          tokens.push(content);
        }
        if (match[6] === "%") {
          tokens.push("%");
        } else {
          tokens.push(parse(match));
        }
        prev = RE.lastIndex;
        match = RE.exec(str);
      }
      content = str.slice(prev);
      if (content.length) {
        tokens.push(content);
      }
      return tokens;
    }
    module.exports = formatTokenize;
  }
});

// node_modules/@stdlib/string-base-format-tokenize/lib/index.js
var require_lib2 = __commonJS({
  "node_modules/@stdlib/string-base-format-tokenize/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main2();
    module.exports = main2;
  }
});

// node_modules/@stdlib/string-format/lib/is_string.js
var require_is_string2 = __commonJS({
  "node_modules/@stdlib/string-format/lib/is_string.js"(exports, module) {
    "use strict";
    function isString(value) {
      return typeof value === "string";
    }
    module.exports = isString;
  }
});

// node_modules/@stdlib/string-format/lib/main.js
var require_main3 = __commonJS({
  "node_modules/@stdlib/string-format/lib/main.js"(exports, module) {
    "use strict";
    var interpolate = require_lib();
    var tokenize = require_lib2();
    var isString = require_is_string2();
    function format(str) {
      var args;
      var i;
      if (!isString(str)) {
        throw new TypeError(format("invalid argument. First argument must be a string. Value: `%s`.", str));
      }
      args = [tokenize(str)];
      for (i = 1; i < arguments.length; i++) {
        args.push(arguments[i]);
      }
      return interpolate.apply(null, args);
    }
    module.exports = format;
  }
});

// node_modules/@stdlib/string-format/lib/index.js
var require_lib3 = __commonJS({
  "node_modules/@stdlib/string-format/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main3();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-define-property/lib/polyfill.js
var require_polyfill = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/polyfill.js"(exports, module) {
    "use strict";
    var format = require_lib3();
    var objectProtoype = Object.prototype;
    var toStr = objectProtoype.toString;
    var defineGetter = objectProtoype.__defineGetter__;
    var defineSetter = objectProtoype.__defineSetter__;
    var lookupGetter = objectProtoype.__lookupGetter__;
    var lookupSetter = objectProtoype.__lookupSetter__;
    function defineProperty(obj, prop, descriptor) {
      var prototype;
      var hasValue;
      var hasGet;
      var hasSet;
      if (typeof obj !== "object" || obj === null || toStr.call(obj) === "[object Array]") {
        throw new TypeError(format("invalid argument. First argument must be an object. Value: `%s`.", obj));
      }
      if (typeof descriptor !== "object" || descriptor === null || toStr.call(descriptor) === "[object Array]") {
        throw new TypeError(format("invalid argument. Property descriptor must be an object. Value: `%s`.", descriptor));
      }
      hasValue = "value" in descriptor;
      if (hasValue) {
        if (lookupGetter.call(obj, prop) || lookupSetter.call(obj, prop)) {
          prototype = obj.__proto__;
          obj.__proto__ = objectProtoype;
          delete obj[prop];
          obj[prop] = descriptor.value;
          obj.__proto__ = prototype;
        } else {
          obj[prop] = descriptor.value;
        }
      }
      hasGet = "get" in descriptor;
      hasSet = "set" in descriptor;
      if (hasValue && (hasGet || hasSet)) {
        throw new Error("invalid argument. Cannot specify one or more accessors and a value or writable attribute in the property descriptor.");
      }
      if (hasGet && defineGetter) {
        defineGetter.call(obj, prop, descriptor.get);
      }
      if (hasSet && defineSetter) {
        defineSetter.call(obj, prop, descriptor.set);
      }
      return obj;
    }
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/utils-define-property/lib/index.js
var require_lib4 = __commonJS({
  "node_modules/@stdlib/utils-define-property/lib/index.js"(exports, module) {
    "use strict";
    var hasDefinePropertySupport = require_has_define_property_support();
    var builtin = require_builtin();
    var polyfill = require_polyfill();
    var defineProperty;
    if (hasDefinePropertySupport()) {
      defineProperty = builtin;
    } else {
      defineProperty = polyfill;
    }
    module.exports = defineProperty;
  }
});

// node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/main.js
var require_main4 = __commonJS({
  "node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/main.js"(exports, module) {
    "use strict";
    var defineProperty = require_lib4();
    function setNonEnumerableReadOnly(obj, prop, value) {
      defineProperty(obj, prop, {
        "configurable": false,
        "enumerable": false,
        "writable": false,
        "value": value
      });
    }
    module.exports = setNonEnumerableReadOnly;
  }
});

// node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/index.js
var require_lib5 = __commonJS({
  "node_modules/@stdlib/utils-define-nonenumerable-read-only-property/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main4();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-nan/lib/main.js
var require_main5 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-nan/lib/main.js"(exports, module) {
    "use strict";
    function isnan(x) {
      return x !== x;
    }
    module.exports = isnan;
  }
});

// node_modules/@stdlib/math-base-assert-is-nan/lib/index.js
var require_lib6 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-nan/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main5();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-floor/lib/main.js
var require_main6 = __commonJS({
  "node_modules/@stdlib/math-base-special-floor/lib/main.js"(exports, module) {
    "use strict";
    var floor = Math.floor;
    module.exports = floor;
  }
});

// node_modules/@stdlib/math-base-special-floor/lib/index.js
var require_lib7 = __commonJS({
  "node_modules/@stdlib/math-base-special-floor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main6();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ceil/lib/main.js
var require_main7 = __commonJS({
  "node_modules/@stdlib/math-base-special-ceil/lib/main.js"(exports, module) {
    "use strict";
    var ceil = Math.ceil;
    module.exports = ceil;
  }
});

// node_modules/@stdlib/math-base-special-ceil/lib/index.js
var require_lib8 = __commonJS({
  "node_modules/@stdlib/math-base-special-ceil/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main7();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-trunc/lib/main.js
var require_main8 = __commonJS({
  "node_modules/@stdlib/math-base-special-trunc/lib/main.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var ceil = require_lib8();
    function trunc(x) {
      if (x < 0) {
        return ceil(x);
      }
      return floor(x);
    }
    module.exports = trunc;
  }
});

// node_modules/@stdlib/math-base-special-trunc/lib/index.js
var require_lib9 = __commonJS({
  "node_modules/@stdlib/math-base-special-trunc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main8();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-ctor/lib/main.js
var require_main9 = __commonJS({
  "node_modules/@stdlib/number-ctor/lib/main.js"(exports, module) {
    "use strict";
    module.exports = Number;
  }
});

// node_modules/@stdlib/number-ctor/lib/index.js
var require_lib10 = __commonJS({
  "node_modules/@stdlib/number-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main9();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-ninf/lib/index.js
var require_lib11 = __commonJS({
  "node_modules/@stdlib/constants-float64-ninf/lib/index.js"(exports, module) {
    "use strict";
    var Number2 = require_lib10();
    var FLOAT64_NINF = Number2.NEGATIVE_INFINITY;
    module.exports = FLOAT64_NINF;
  }
});

// node_modules/@stdlib/constants-float64-pinf/lib/index.js
var require_lib12 = __commonJS({
  "node_modules/@stdlib/constants-float64-pinf/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_PINF = Number.POSITIVE_INFINITY;
    module.exports = FLOAT64_PINF;
  }
});

// node_modules/@stdlib/constants-float64-exponent-bias/lib/index.js
var require_lib13 = __commonJS({
  "node_modules/@stdlib/constants-float64-exponent-bias/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_EXPONENT_BIAS = 1023 | 0;
    module.exports = FLOAT64_EXPONENT_BIAS;
  }
});

// node_modules/@stdlib/constants-float64-max-base2-exponent/lib/index.js
var require_lib14 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-base2-exponent/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_BASE2_EXPONENT = 1023 | 0;
    module.exports = FLOAT64_MAX_BASE2_EXPONENT;
  }
});

// node_modules/@stdlib/constants-float64-max-base2-exponent-subnormal/lib/index.js
var require_lib15 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-base2-exponent-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_BASE2_EXPONENT_SUBNORMAL = -1023 | 0;
    module.exports = FLOAT64_MAX_BASE2_EXPONENT_SUBNORMAL;
  }
});

// node_modules/@stdlib/constants-float64-min-base2-exponent-subnormal/lib/index.js
var require_lib16 = __commonJS({
  "node_modules/@stdlib/constants-float64-min-base2-exponent-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MIN_BASE2_EXPONENT_SUBNORMAL = -1074 | 0;
    module.exports = FLOAT64_MIN_BASE2_EXPONENT_SUBNORMAL;
  }
});

// node_modules/@stdlib/math-base-assert-is-infinite/lib/main.js
var require_main10 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-infinite/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    var NINF = require_lib11();
    function isInfinite(x) {
      return x === PINF || x === NINF;
    }
    module.exports = isInfinite;
  }
});

// node_modules/@stdlib/math-base-assert-is-infinite/lib/index.js
var require_lib17 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-infinite/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main10();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-sign-mask/lib/index.js
var require_lib18 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-sign-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_SIGN_MASK = 2147483648 >>> 0;
    module.exports = FLOAT64_HIGH_WORD_SIGN_MASK;
  }
});

// node_modules/@stdlib/constants-float64-high-word-abs-mask/lib/index.js
var require_lib19 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-abs-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_ABS_MASK = 2147483647 >>> 0;
    module.exports = FLOAT64_HIGH_WORD_ABS_MASK;
  }
});

// node_modules/@stdlib/assert-has-symbol-support/lib/main.js
var require_main11 = __commonJS({
  "node_modules/@stdlib/assert-has-symbol-support/lib/main.js"(exports, module) {
    "use strict";
    function hasSymbolSupport() {
      return typeof Symbol === "function" && typeof /* @__PURE__ */ Symbol("foo") === "symbol";
    }
    module.exports = hasSymbolSupport;
  }
});

// node_modules/@stdlib/assert-has-symbol-support/lib/index.js
var require_lib20 = __commonJS({
  "node_modules/@stdlib/assert-has-symbol-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main11();
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-tostringtag-support/lib/main.js
var require_main12 = __commonJS({
  "node_modules/@stdlib/assert-has-tostringtag-support/lib/main.js"(exports, module) {
    "use strict";
    var hasSymbols = require_lib20();
    var FLG = hasSymbols();
    function hasToStringTagSupport() {
      return FLG && typeof Symbol.toStringTag === "symbol";
    }
    module.exports = hasToStringTagSupport;
  }
});

// node_modules/@stdlib/assert-has-tostringtag-support/lib/index.js
var require_lib21 = __commonJS({
  "node_modules/@stdlib/assert-has-tostringtag-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main12();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-native-class/lib/tostring.js
var require_tostring = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/tostring.js"(exports, module) {
    "use strict";
    var toStr = Object.prototype.toString;
    module.exports = toStr;
  }
});

// node_modules/@stdlib/utils-native-class/lib/main.js
var require_main13 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/main.js"(exports, module) {
    "use strict";
    var toStr = require_tostring();
    function nativeClass(v) {
      return toStr.call(v);
    }
    module.exports = nativeClass;
  }
});

// node_modules/@stdlib/assert-has-own-property/lib/main.js
var require_main14 = __commonJS({
  "node_modules/@stdlib/assert-has-own-property/lib/main.js"(exports, module) {
    "use strict";
    var has = Object.prototype.hasOwnProperty;
    function hasOwnProp(value, property) {
      if (value === void 0 || value === null) {
        return false;
      }
      return has.call(value, property);
    }
    module.exports = hasOwnProp;
  }
});

// node_modules/@stdlib/assert-has-own-property/lib/index.js
var require_lib22 = __commonJS({
  "node_modules/@stdlib/assert-has-own-property/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main14();
    module.exports = main2;
  }
});

// node_modules/@stdlib/symbol-ctor/lib/main.js
var require_main15 = __commonJS({
  "node_modules/@stdlib/symbol-ctor/lib/main.js"(exports, module) {
    "use strict";
    var Sym = typeof Symbol === "function" ? Symbol : void 0;
    module.exports = Sym;
  }
});

// node_modules/@stdlib/symbol-ctor/lib/index.js
var require_lib23 = __commonJS({
  "node_modules/@stdlib/symbol-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main15();
    module.exports = main2;
  }
});

// node_modules/@stdlib/utils-native-class/lib/tostringtag.js
var require_tostringtag = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/tostringtag.js"(exports, module) {
    "use strict";
    var Symbol2 = require_lib23();
    var toStrTag = typeof Symbol2 === "function" ? Symbol2.toStringTag : "";
    module.exports = toStrTag;
  }
});

// node_modules/@stdlib/utils-native-class/lib/polyfill.js
var require_polyfill2 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/polyfill.js"(exports, module) {
    "use strict";
    var hasOwnProp = require_lib22();
    var toStringTag = require_tostringtag();
    var toStr = require_tostring();
    function nativeClass(v) {
      var isOwn;
      var tag;
      var out;
      if (v === null || v === void 0) {
        return toStr.call(v);
      }
      tag = v[toStringTag];
      isOwn = hasOwnProp(v, toStringTag);
      try {
        v[toStringTag] = void 0;
      } catch (err) {
        return toStr.call(v);
      }
      out = toStr.call(v);
      if (isOwn) {
        v[toStringTag] = tag;
      } else {
        delete v[toStringTag];
      }
      return out;
    }
    module.exports = nativeClass;
  }
});

// node_modules/@stdlib/utils-native-class/lib/index.js
var require_lib24 = __commonJS({
  "node_modules/@stdlib/utils-native-class/lib/index.js"(exports, module) {
    "use strict";
    var hasToStringTag = require_lib21();
    var builtin = require_main13();
    var polyfill = require_polyfill2();
    var main2;
    if (hasToStringTag()) {
      main2 = polyfill;
    } else {
      main2 = builtin;
    }
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-is-uint32array/lib/main.js
var require_main16 = __commonJS({
  "node_modules/@stdlib/assert-is-uint32array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint32Array = typeof Uint32Array === "function";
    function isUint32Array(value) {
      return hasUint32Array && value instanceof Uint32Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint32Array]";
    }
    module.exports = isUint32Array;
  }
});

// node_modules/@stdlib/assert-is-uint32array/lib/index.js
var require_lib25 = __commonJS({
  "node_modules/@stdlib/assert-is-uint32array/lib/index.js"(exports, module) {
    "use strict";
    var isUint32Array = require_main16();
    module.exports = isUint32Array;
  }
});

// node_modules/@stdlib/constants-uint32-max/lib/index.js
var require_lib26 = __commonJS({
  "node_modules/@stdlib/constants-uint32-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT32_MAX = 4294967295;
    module.exports = UINT32_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/uint32array.js
var require_uint32array = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/uint32array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint32Array === "function" ? Uint32Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/main.js
var require_main17 = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint32Array = require_lib25();
    var UINT32_MAX = require_lib26();
    var GlobalUint32Array = require_uint32array();
    function hasUint32ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint32Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT32_MAX + 1, UINT32_MAX + 2];
        arr = new GlobalUint32Array(arr);
        bool = isUint32Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT32_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint32ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint32array-support/lib/index.js
var require_lib27 = __commonJS({
  "node_modules/@stdlib/assert-has-uint32array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint32ArraySupport = require_main17();
    module.exports = hasUint32ArraySupport;
  }
});

// node_modules/@stdlib/array-uint32/lib/main.js
var require_main18 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint32Array === "function" ? Uint32Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint32/lib/polyfill.js
var require_polyfill3 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint32/lib/index.js
var require_lib28 = __commonJS({
  "node_modules/@stdlib/array-uint32/lib/index.js"(exports, module) {
    "use strict";
    var hasUint32ArraySupport = require_lib27();
    var builtin = require_main18();
    var polyfill = require_polyfill3();
    var ctor;
    if (hasUint32ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-float64array/lib/main.js
var require_main19 = __commonJS({
  "node_modules/@stdlib/assert-is-float64array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasFloat64Array = typeof Float64Array === "function";
    function isFloat64Array(value) {
      return hasFloat64Array && value instanceof Float64Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Float64Array]";
    }
    module.exports = isFloat64Array;
  }
});

// node_modules/@stdlib/assert-is-float64array/lib/index.js
var require_lib29 = __commonJS({
  "node_modules/@stdlib/assert-is-float64array/lib/index.js"(exports, module) {
    "use strict";
    var isFloat64Array = require_main19();
    module.exports = isFloat64Array;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/float64array.js
var require_float64array = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/float64array.js"(exports, module) {
    "use strict";
    var main2 = typeof Float64Array === "function" ? Float64Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/main.js
var require_main20 = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/main.js"(exports, module) {
    "use strict";
    var isFloat64Array = require_lib29();
    var GlobalFloat64Array = require_float64array();
    function hasFloat64ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalFloat64Array !== "function") {
        return false;
      }
      try {
        arr = new GlobalFloat64Array([1, 3.14, -3.14, NaN]);
        bool = isFloat64Array(arr) && arr[0] === 1 && arr[1] === 3.14 && arr[2] === -3.14 && arr[3] !== arr[3];
      } catch (err) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasFloat64ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-float64array-support/lib/index.js
var require_lib30 = __commonJS({
  "node_modules/@stdlib/assert-has-float64array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasFloat64ArraySupport = require_main20();
    module.exports = hasFloat64ArraySupport;
  }
});

// node_modules/@stdlib/array-float64/lib/main.js
var require_main21 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Float64Array === "function" ? Float64Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-float64/lib/polyfill.js
var require_polyfill4 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-float64/lib/index.js
var require_lib31 = __commonJS({
  "node_modules/@stdlib/array-float64/lib/index.js"(exports, module) {
    "use strict";
    var hasFloat64ArraySupport = require_lib30();
    var builtin = require_main21();
    var polyfill = require_polyfill4();
    var ctor;
    if (hasFloat64ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-uint8array/lib/main.js
var require_main22 = __commonJS({
  "node_modules/@stdlib/assert-is-uint8array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint8Array = typeof Uint8Array === "function";
    function isUint8Array(value) {
      return hasUint8Array && value instanceof Uint8Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint8Array]";
    }
    module.exports = isUint8Array;
  }
});

// node_modules/@stdlib/assert-is-uint8array/lib/index.js
var require_lib32 = __commonJS({
  "node_modules/@stdlib/assert-is-uint8array/lib/index.js"(exports, module) {
    "use strict";
    var isUint8Array = require_main22();
    module.exports = isUint8Array;
  }
});

// node_modules/@stdlib/constants-uint8-max/lib/index.js
var require_lib33 = __commonJS({
  "node_modules/@stdlib/constants-uint8-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT8_MAX = 255 | 0;
    module.exports = UINT8_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/uint8array.js
var require_uint8array = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/uint8array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint8Array === "function" ? Uint8Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/main.js
var require_main23 = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint8Array = require_lib32();
    var UINT8_MAX = require_lib33();
    var GlobalUint8Array = require_uint8array();
    function hasUint8ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint8Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT8_MAX + 1, UINT8_MAX + 2];
        arr = new GlobalUint8Array(arr);
        bool = isUint8Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT8_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint8ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint8array-support/lib/index.js
var require_lib34 = __commonJS({
  "node_modules/@stdlib/assert-has-uint8array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint8ArraySupport = require_main23();
    module.exports = hasUint8ArraySupport;
  }
});

// node_modules/@stdlib/array-uint8/lib/main.js
var require_main24 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint8Array === "function" ? Uint8Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint8/lib/polyfill.js
var require_polyfill5 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint8/lib/index.js
var require_lib35 = __commonJS({
  "node_modules/@stdlib/array-uint8/lib/index.js"(exports, module) {
    "use strict";
    var hasUint8ArraySupport = require_lib34();
    var builtin = require_main24();
    var polyfill = require_polyfill5();
    var ctor;
    if (hasUint8ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-uint16array/lib/main.js
var require_main25 = __commonJS({
  "node_modules/@stdlib/assert-is-uint16array/lib/main.js"(exports, module) {
    "use strict";
    var nativeClass = require_lib24();
    var hasUint16Array = typeof Uint16Array === "function";
    function isUint16Array(value) {
      return hasUint16Array && value instanceof Uint16Array || // eslint-disable-line stdlib/require-globals
      nativeClass(value) === "[object Uint16Array]";
    }
    module.exports = isUint16Array;
  }
});

// node_modules/@stdlib/assert-is-uint16array/lib/index.js
var require_lib36 = __commonJS({
  "node_modules/@stdlib/assert-is-uint16array/lib/index.js"(exports, module) {
    "use strict";
    var isUint16Array = require_main25();
    module.exports = isUint16Array;
  }
});

// node_modules/@stdlib/constants-uint16-max/lib/index.js
var require_lib37 = __commonJS({
  "node_modules/@stdlib/constants-uint16-max/lib/index.js"(exports, module) {
    "use strict";
    var UINT16_MAX = 65535 | 0;
    module.exports = UINT16_MAX;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/uint16array.js
var require_uint16array = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/uint16array.js"(exports, module) {
    "use strict";
    var main2 = typeof Uint16Array === "function" ? Uint16Array : null;
    module.exports = main2;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/main.js
var require_main26 = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/main.js"(exports, module) {
    "use strict";
    var isUint16Array = require_lib36();
    var UINT16_MAX = require_lib37();
    var GlobalUint16Array = require_uint16array();
    function hasUint16ArraySupport() {
      var bool;
      var arr;
      if (typeof GlobalUint16Array !== "function") {
        return false;
      }
      try {
        arr = [1, 3.14, -3.14, UINT16_MAX + 1, UINT16_MAX + 2];
        arr = new GlobalUint16Array(arr);
        bool = isUint16Array(arr) && arr[0] === 1 && arr[1] === 3 && // truncation
        arr[2] === UINT16_MAX - 2 && // truncation and wrap around
        arr[3] === 0 && // wrap around
        arr[4] === 1;
      } catch (err) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasUint16ArraySupport;
  }
});

// node_modules/@stdlib/assert-has-uint16array-support/lib/index.js
var require_lib38 = __commonJS({
  "node_modules/@stdlib/assert-has-uint16array-support/lib/index.js"(exports, module) {
    "use strict";
    var hasUint16ArraySupport = require_main26();
    module.exports = hasUint16ArraySupport;
  }
});

// node_modules/@stdlib/array-uint16/lib/main.js
var require_main27 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/main.js"(exports, module) {
    "use strict";
    var ctor = typeof Uint16Array === "function" ? Uint16Array : void 0;
    module.exports = ctor;
  }
});

// node_modules/@stdlib/array-uint16/lib/polyfill.js
var require_polyfill6 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/polyfill.js"(exports, module) {
    "use strict";
    function polyfill() {
      throw new Error("not implemented");
    }
    module.exports = polyfill;
  }
});

// node_modules/@stdlib/array-uint16/lib/index.js
var require_lib39 = __commonJS({
  "node_modules/@stdlib/array-uint16/lib/index.js"(exports, module) {
    "use strict";
    var hasUint16ArraySupport = require_lib38();
    var builtin = require_main27();
    var polyfill = require_polyfill6();
    var ctor;
    if (hasUint16ArraySupport()) {
      ctor = builtin;
    } else {
      ctor = polyfill;
    }
    module.exports = ctor;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/ctors.js
var require_ctors = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/ctors.js"(exports, module) {
    "use strict";
    var Uint8Array2 = require_lib35();
    var Uint16Array2 = require_lib39();
    var ctors = {
      "uint16": Uint16Array2,
      "uint8": Uint8Array2
    };
    module.exports = ctors;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/main.js
var require_main28 = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/main.js"(exports, module) {
    "use strict";
    var ctors = require_ctors();
    var bool;
    function isLittleEndian() {
      var uint16view;
      var uint8view;
      uint16view = new ctors["uint16"](1);
      uint16view[0] = 4660;
      uint8view = new ctors["uint8"](uint16view.buffer);
      return uint8view[0] === 52;
    }
    bool = isLittleEndian();
    module.exports = bool;
  }
});

// node_modules/@stdlib/assert-is-little-endian/lib/index.js
var require_lib40 = __commonJS({
  "node_modules/@stdlib/assert-is-little-endian/lib/index.js"(exports, module) {
    "use strict";
    var IS_LITTLE_ENDIAN = require_main28();
    module.exports = IS_LITTLE_ENDIAN;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/indices.js
var require_indices = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/indices.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var indices;
    var HIGH;
    var LOW;
    if (isLittleEndian === true) {
      HIGH = 1;
      LOW = 0;
    } else {
      HIGH = 0;
      LOW = 1;
    }
    indices = {
      "HIGH": HIGH,
      "LOW": LOW
    };
    module.exports = indices;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/assign.js
var require_assign = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/assign.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var indices = require_indices();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    var HIGH = indices.HIGH;
    var LOW = indices.LOW;
    function toWords(x, out, stride, offset) {
      FLOAT64_VIEW[0] = x;
      out[offset] = UINT32_VIEW[HIGH];
      out[offset + stride] = UINT32_VIEW[LOW];
      return out;
    }
    module.exports = toWords;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/main.js
var require_main29 = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/main.js"(exports, module) {
    "use strict";
    var fcn = require_assign();
    function toWords(x) {
      return fcn(x, [0 >>> 0, 0 >>> 0], 1, 0);
    }
    module.exports = toWords;
  }
});

// node_modules/@stdlib/number-float64-base-to-words/lib/index.js
var require_lib41 = __commonJS({
  "node_modules/@stdlib/number-float64-base-to-words/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main29();
    var assign = require_assign();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/high.js
var require_high = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/high.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var HIGH;
    if (isLittleEndian === true) {
      HIGH = 1;
    } else {
      HIGH = 0;
    }
    module.exports = HIGH;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/main.js
var require_main30 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var HIGH = require_high();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function getHighWord(x) {
      FLOAT64_VIEW[0] = x;
      return UINT32_VIEW[HIGH];
    }
    module.exports = getHighWord;
  }
});

// node_modules/@stdlib/number-float64-base-get-high-word/lib/index.js
var require_lib42 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-high-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main30();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/indices.js
var require_indices2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/indices.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var indices;
    var HIGH;
    var LOW;
    if (isLittleEndian === true) {
      HIGH = 1;
      LOW = 0;
    } else {
      HIGH = 0;
      LOW = 1;
    }
    indices = {
      "HIGH": HIGH,
      "LOW": LOW
    };
    module.exports = indices;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/main.js
var require_main31 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var indices = require_indices2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    var HIGH = indices.HIGH;
    var LOW = indices.LOW;
    function fromWords(high, low) {
      UINT32_VIEW[HIGH] = high;
      UINT32_VIEW[LOW] = low;
      return FLOAT64_VIEW[0];
    }
    module.exports = fromWords;
  }
});

// node_modules/@stdlib/number-float64-base-from-words/lib/index.js
var require_lib43 = __commonJS({
  "node_modules/@stdlib/number-float64-base-from-words/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main31();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-copysign/lib/main.js
var require_main32 = __commonJS({
  "node_modules/@stdlib/math-base-special-copysign/lib/main.js"(exports, module) {
    "use strict";
    var SIGN_MASK = require_lib18();
    var ABS_MASK = require_lib19();
    var toWords = require_lib41();
    var getHighWord = require_lib42();
    var fromWords = require_lib43();
    var WORDS = [0, 0];
    function copysign(x, y) {
      var hx;
      var hy;
      toWords.assign(x, WORDS, 1, 0);
      hx = WORDS[0];
      hx &= ABS_MASK;
      hy = getHighWord(y);
      hy &= SIGN_MASK;
      hx |= hy;
      return fromWords(hx, WORDS[1]);
    }
    module.exports = copysign;
  }
});

// node_modules/@stdlib/math-base-special-copysign/lib/index.js
var require_lib44 = __commonJS({
  "node_modules/@stdlib/math-base-special-copysign/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main32();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-smallest-normal/lib/index.js
var require_lib45 = __commonJS({
  "node_modules/@stdlib/constants-float64-smallest-normal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_NORMAL = 22250738585072014e-324;
    module.exports = FLOAT64_SMALLEST_NORMAL;
  }
});

// node_modules/@stdlib/math-base-special-abs/lib/main.js
var require_main33 = __commonJS({
  "node_modules/@stdlib/math-base-special-abs/lib/main.js"(exports, module) {
    "use strict";
    function abs(x) {
      return Math.abs(x);
    }
    module.exports = abs;
  }
});

// node_modules/@stdlib/math-base-special-abs/lib/index.js
var require_lib46 = __commonJS({
  "node_modules/@stdlib/math-base-special-abs/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main33();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/assign.js
var require_assign2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/assign.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_NORMAL = require_lib45();
    var isInfinite = require_lib17();
    var isnan = require_lib6();
    var abs = require_lib46();
    var SCALAR = 4503599627370496;
    function normalize(x, out, stride, offset) {
      if (isnan(x) || isInfinite(x)) {
        out[offset] = x;
        out[offset + stride] = 0;
        return out;
      }
      if (x !== 0 && abs(x) < FLOAT64_SMALLEST_NORMAL) {
        out[offset] = x * SCALAR;
        out[offset + stride] = -52;
        return out;
      }
      out[offset] = x;
      out[offset + stride] = 0;
      return out;
    }
    module.exports = normalize;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/main.js
var require_main34 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/main.js"(exports, module) {
    "use strict";
    var fcn = require_assign2();
    function normalize(x) {
      return fcn(x, [0, 0], 1, 0);
    }
    module.exports = normalize;
  }
});

// node_modules/@stdlib/number-float64-base-normalize/lib/index.js
var require_lib47 = __commonJS({
  "node_modules/@stdlib/number-float64-base-normalize/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main34();
    var assign = require_assign2();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-exponent-mask/lib/index.js
var require_lib48 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-exponent-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_EXPONENT_MASK = 2146435072;
    module.exports = FLOAT64_HIGH_WORD_EXPONENT_MASK;
  }
});

// node_modules/@stdlib/number-float64-base-exponent/lib/main.js
var require_main35 = __commonJS({
  "node_modules/@stdlib/number-float64-base-exponent/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var EXP_MASK = require_lib48();
    var BIAS = require_lib13();
    function exponent(x) {
      var high = getHighWord(x);
      high = (high & EXP_MASK) >>> 20;
      return high - BIAS | 0;
    }
    module.exports = exponent;
  }
});

// node_modules/@stdlib/number-float64-base-exponent/lib/index.js
var require_lib49 = __commonJS({
  "node_modules/@stdlib/number-float64-base-exponent/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main35();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ldexp/lib/main.js
var require_main36 = __commonJS({
  "node_modules/@stdlib/math-base-special-ldexp/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    var NINF = require_lib11();
    var BIAS = require_lib13();
    var MAX_EXPONENT = require_lib14();
    var MAX_SUBNORMAL_EXPONENT = require_lib15();
    var MIN_SUBNORMAL_EXPONENT = require_lib16();
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var copysign = require_lib44();
    var normalize = require_lib47().assign;
    var floatExp = require_lib49();
    var toWords = require_lib41();
    var fromWords = require_lib43();
    var TWO52_INV = 2220446049250313e-31;
    var CLEAR_EXP_MASK = 2148532223 >>> 0;
    var FRAC = [0, 0];
    var WORDS = [0, 0];
    function ldexp(frac, exp) {
      var high;
      var m;
      if (exp === 0 || frac === 0 || // handles +-0
      isnan(frac) || isInfinite(frac)) {
        return frac;
      }
      normalize(frac, FRAC, 1, 0);
      frac = FRAC[0];
      exp += FRAC[1];
      exp += floatExp(frac);
      if (exp < MIN_SUBNORMAL_EXPONENT) {
        return copysign(0, frac);
      }
      if (exp > MAX_EXPONENT) {
        if (frac < 0) {
          return NINF;
        }
        return PINF;
      }
      if (exp <= MAX_SUBNORMAL_EXPONENT) {
        exp += 52;
        m = TWO52_INV;
      } else {
        m = 1;
      }
      toWords.assign(frac, WORDS, 1, 0);
      high = WORDS[0];
      high &= CLEAR_EXP_MASK;
      high |= exp + BIAS << 20;
      return m * fromWords(high, WORDS[1]);
    }
    module.exports = ldexp;
  }
});

// node_modules/@stdlib/math-base-special-ldexp/lib/index.js
var require_lib50 = __commonJS({
  "node_modules/@stdlib/math-base-special-ldexp/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main36();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/polyval_p.js
var require_polyval_p = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666602;
      }
      return 0.16666666666666602 + x * (-0.0027777777777015593 + x * (6613756321437934e-20 + x * (-16533902205465252e-22 + x * 41381367970572385e-24)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/expmulti.js
var require_expmulti = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/expmulti.js"(exports, module) {
    "use strict";
    var ldexp = require_lib50();
    var polyvalP = require_polyval_p();
    function expmulti(hi2, lo2, k) {
      var r;
      var t;
      var c;
      var y;
      r = hi2 - lo2;
      t = r * r;
      c = r - t * polyvalP(t);
      y = 1 - (lo2 - r * c / (2 - c) - hi2);
      return ldexp(y, k);
    }
    module.exports = expmulti;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/main.js
var require_main37 = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var trunc = require_lib9();
    var NINF = require_lib11();
    var PINF = require_lib12();
    var expmulti = require_expmulti();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var LOG2_E = 1.4426950408889634;
    var OVERFLOW = 709.782712893384;
    var UNDERFLOW = -745.1332191019411;
    var NEARZERO = 1 / (1 << 28);
    var NEG_NEARZERO = -NEARZERO;
    function exp(x) {
      var hi2;
      var lo2;
      var k;
      if (isnan(x) || x === PINF) {
        return x;
      }
      if (x === NINF) {
        return 0;
      }
      if (x > OVERFLOW) {
        return PINF;
      }
      if (x < UNDERFLOW) {
        return 0;
      }
      if (x > NEG_NEARZERO && x < NEARZERO) {
        return 1 + x;
      }
      if (x < 0) {
        k = trunc(LOG2_E * x - 0.5);
      } else {
        k = trunc(LOG2_E * x + 0.5);
      }
      hi2 = x - k * LN2_HI;
      lo2 = k * LN2_LO;
      return expmulti(hi2, lo2, k);
    }
    module.exports = exp;
  }
});

// node_modules/@stdlib/math-base-special-exp/lib/index.js
var require_lib51 = __commonJS({
  "node_modules/@stdlib/math-base-special-exp/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main37();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/low.js
var require_low = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/low.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var LOW;
    if (isLittleEndian === true) {
      LOW = 0;
    } else {
      LOW = 1;
    }
    module.exports = LOW;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/main.js
var require_main38 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var LOW = require_low();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function setLowWord(x, low) {
      FLOAT64_VIEW[0] = x;
      UINT32_VIEW[LOW] = low >>> 0;
      return FLOAT64_VIEW[0];
    }
    module.exports = setLowWord;
  }
});

// node_modules/@stdlib/number-float64-base-set-low-word/lib/index.js
var require_lib52 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-low-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main38();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_pp.js
var require_polyval_pp = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_pp.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.3250421072470015;
      }
      return -0.3250421072470015 + x * (-0.02848174957559851 + x * (-0.005770270296489442 + x * -23763016656650163e-21));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_qq.js
var require_polyval_qq = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_qq.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.39791722395915535;
      }
      return 0.39791722395915535 + x * (0.0650222499887673 + x * (0.005081306281875766 + x * (13249473800432164e-20 + x * -3960228278775368e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_pa.js
var require_polyval_pa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_pa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.41485611868374833;
      }
      return 0.41485611868374833 + x * (-0.3722078760357013 + x * (0.31834661990116175 + x * (-0.11089469428239668 + x * (0.035478304325618236 + x * -0.002166375594868791))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_qa.js
var require_polyval_qa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_qa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.10642088040084423;
      }
      return 0.10642088040084423 + x * (0.540397917702171 + x * (0.07182865441419627 + x * (0.12617121980876164 + x * (0.01363708391202905 + x * 0.011984499846799107))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_ra.js
var require_polyval_ra = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_ra.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.6938585727071818;
      }
      return -0.6938585727071818 + x * (-10.558626225323291 + x * (-62.375332450326006 + x * (-162.39666946257347 + x * (-184.60509290671104 + x * (-81.2874355063066 + x * -9.814329344169145)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_sa.js
var require_polyval_sa = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_sa.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 19.651271667439257;
      }
      return 19.651271667439257 + x * (137.65775414351904 + x * (434.56587747522923 + x * (645.3872717332679 + x * (429.00814002756783 + x * (108.63500554177944 + x * (6.570249770319282 + x * -0.0604244152148581))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_rb.js
var require_polyval_rb = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_rb.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.799283237680523;
      }
      return -0.799283237680523 + x * (-17.757954917754752 + x * (-160.63638485582192 + x * (-637.5664433683896 + x * (-1025.0951316110772 + x * -483.5191916086514))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/polyval_sb.js
var require_polyval_sb = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/polyval_sb.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 30.33806074348246;
      }
      return 30.33806074348246 + x * (325.7925129965739 + x * (1536.729586084437 + x * (3199.8582195085955 + x * (2553.0504064331644 + x * (474.52854120695537 + x * -22.44095244658582)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/main.js
var require_main39 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var exp = require_lib51();
    var setLowWord = require_lib52();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var polyvalPP = require_polyval_pp();
    var polyvalQQ = require_polyval_qq();
    var polyvalPA = require_polyval_pa();
    var polyvalQA = require_polyval_qa();
    var polyvalRA = require_polyval_ra();
    var polyvalSA = require_polyval_sa();
    var polyvalRB = require_polyval_rb();
    var polyvalSB = require_polyval_sb();
    var TINY = 1e-300;
    var SMALL = 13877787807814457e-33;
    var ERX = 0.8450629115104675;
    var PPC = 0.12837916709551256;
    var QQC = 1;
    var PAC = -0.0023621185607526594;
    var QAC = 1;
    var RAC = -0.009864944034847148;
    var SAC = 1;
    var RBC = -0.0098649429247001;
    var SBC = 1;
    function erfc(x) {
      var sign;
      var ax;
      var z;
      var r;
      var s;
      var y;
      var p;
      var q;
      if (isnan(x)) {
        return NaN;
      }
      if (x === PINF) {
        return 0;
      }
      if (x === NINF) {
        return 2;
      }
      if (x === 0) {
        return 1;
      }
      if (x < 0) {
        sign = true;
        ax = -x;
      } else {
        sign = false;
        ax = x;
      }
      if (ax < 0.84375) {
        if (ax < SMALL) {
          return 1 - x;
        }
        z = x * x;
        r = PPC + z * polyvalPP(z);
        s = QQC + z * polyvalQQ(z);
        y = r / s;
        if (x < 0.25) {
          return 1 - (x + x * y);
        }
        r = x * y;
        r += x - 0.5;
        return 0.5 - r;
      }
      if (ax < 1.25) {
        s = ax - 1;
        p = PAC + s * polyvalPA(s);
        q = QAC + s * polyvalQA(s);
        if (sign) {
          return 1 + ERX + p / q;
        }
        return 1 - ERX - p / q;
      }
      if (ax < 28) {
        s = 1 / (ax * ax);
        if (ax < 2.857142857142857) {
          r = RAC + s * polyvalRA(s);
          s = SAC + s * polyvalSA(s);
        } else {
          if (x < -6) {
            return 2 - TINY;
          }
          r = RBC + s * polyvalRB(s);
          s = SBC + s * polyvalSB(s);
        }
        z = setLowWord(ax, 0);
        r = exp(-(z * z) - 0.5625) * exp((z - ax) * (z + ax) + r / s);
        if (sign) {
          return 2 - r / ax;
        }
        return r / ax;
      }
      if (sign) {
        return 2 - TINY;
      }
      return TINY * TINY;
    }
    module.exports = erfc;
  }
});

// node_modules/@stdlib/math-base-special-erfc/lib/index.js
var require_lib53 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main39();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-sqrt/lib/main.js
var require_main40 = __commonJS({
  "node_modules/@stdlib/math-base-special-sqrt/lib/main.js"(exports, module) {
    "use strict";
    var sqrt = Math.sqrt;
    module.exports = sqrt;
  }
});

// node_modules/@stdlib/math-base-special-sqrt/lib/index.js
var require_lib54 = __commonJS({
  "node_modules/@stdlib/math-base-special-sqrt/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main40();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/main.js
var require_main41 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/main.js"(exports, module) {
    "use strict";
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var isnan = require_lib6();
    function cdf(x, mu, sigma) {
      var denom;
      var xc;
      if (isnan(x) || isnan(mu) || isnan(sigma) || sigma < 0) {
        return NaN;
      }
      if (sigma === 0) {
        return x < mu ? 0 : 1;
      }
      denom = sigma * sqrt(2);
      xc = x - mu;
      return 0.5 * erfc(-xc / denom);
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/utils-constant-function/lib/main.js
var require_main42 = __commonJS({
  "node_modules/@stdlib/utils-constant-function/lib/main.js"(exports, module) {
    "use strict";
    function wrap2(value) {
      return constantFunction;
      function constantFunction() {
        return value;
      }
    }
    module.exports = wrap2;
  }
});

// node_modules/@stdlib/utils-constant-function/lib/index.js
var require_lib55 = __commonJS({
  "node_modules/@stdlib/utils-constant-function/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main42();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/main.js
var require_main43 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function cdf(x, mu) {
      if (isnan(x) || isnan(mu)) {
        return NaN;
      }
      return x < mu ? 0 : 1;
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/factory.js
var require_factory = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var isnan = require_lib6();
    function factory(mu) {
      if (isnan(mu)) {
        return constantFunction(NaN);
      }
      return cdf;
      function cdf(x) {
        if (isnan(x)) {
          return NaN;
        }
        return x < mu ? 0 : 1;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/index.js
var require_lib56 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main43();
    var factory = require_factory();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/factory.js
var require_factory2 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var degenerate2 = require_lib56().factory;
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var erfc = require_lib53();
    function factory(mu, sigma) {
      var denom;
      if (isnan(mu) || isnan(sigma) || sigma < 0) {
        return constantFunction(NaN);
      }
      if (sigma === 0) {
        return degenerate2(mu);
      }
      denom = sigma * sqrt(2);
      return cdf;
      function cdf(x) {
        var xc;
        if (isnan(x)) {
          return NaN;
        }
        xc = x - mu;
        return 0.5 * erfc(-xc / denom);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-cdf/lib/index.js
var require_lib57 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main41();
    var factory = require_factory2();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/high.js
var require_high2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/high.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var HIGH;
    if (isLittleEndian === true) {
      HIGH = 1;
    } else {
      HIGH = 0;
    }
    module.exports = HIGH;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/main.js
var require_main44 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var HIGH = require_high2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function setHighWord(x, high) {
      FLOAT64_VIEW[0] = x;
      UINT32_VIEW[HIGH] = high >>> 0;
      return FLOAT64_VIEW[0];
    }
    module.exports = setHighWord;
  }
});

// node_modules/@stdlib/number-float64-base-set-high-word/lib/index.js
var require_lib58 = __commonJS({
  "node_modules/@stdlib/number-float64-base-set-high-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main44();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/polyval_p.js
var require_polyval_p2 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.3999999999940942;
      }
      return 0.3999999999940942 + x * (0.22222198432149784 + x * 0.15313837699209373);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/polyval_q.js
var require_polyval_q = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/polyval_q.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6666666666666735;
      }
      return 0.6666666666666735 + x * (0.2857142874366239 + x * (0.1818357216161805 + x * 0.14798198605116586));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/main.js
var require_main45 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var isnan = require_lib6();
    var BIAS = require_lib13();
    var NINF = require_lib11();
    var polyvalP = require_polyval_p2();
    var polyvalQ = require_polyval_q();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var TWO54 = 18014398509481984;
    var ONE_THIRD = 0.3333333333333333;
    var HIGH_SIGNIFICAND_MASK = 1048575 | 0;
    var HIGH_MAX_NORMAL_EXP = 2146435072 | 0;
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    function ln(x) {
      var hfsq;
      var hx;
      var t2;
      var t1;
      var k;
      var R;
      var f;
      var i;
      var j;
      var s;
      var w;
      var z;
      if (x === 0) {
        return NINF;
      }
      if (isnan(x) || x < 0) {
        return NaN;
      }
      hx = getHighWord(x);
      k = 0 | 0;
      if (hx < HIGH_MIN_NORMAL_EXP) {
        k -= 54 | 0;
        x *= TWO54;
        hx = getHighWord(x);
      }
      if (hx >= HIGH_MAX_NORMAL_EXP) {
        return x + x;
      }
      k += (hx >> 20) - BIAS | 0;
      hx &= HIGH_SIGNIFICAND_MASK;
      i = hx + 614244 & 1048576 | 0;
      x = setHighWord(x, hx | i ^ HIGH_BIASED_EXP_0);
      k += i >> 20 | 0;
      f = x - 1;
      if ((HIGH_SIGNIFICAND_MASK & 2 + hx) < 3) {
        if (f === 0) {
          if (k === 0) {
            return 0;
          }
          return k * LN2_HI + k * LN2_LO;
        }
        R = f * f * (0.5 - ONE_THIRD * f);
        if (k === 0) {
          return f - R;
        }
        return k * LN2_HI - (R - k * LN2_LO - f);
      }
      s = f / (2 + f);
      z = s * s;
      i = hx - 398458 | 0;
      w = z * z;
      j = 440401 - hx | 0;
      t1 = w * polyvalP(w);
      t2 = z * polyvalQ(w);
      i |= j;
      R = t2 + t1;
      if (i > 0) {
        hfsq = 0.5 * f * f;
        if (k === 0) {
          return f - (hfsq - s * (hfsq + R));
        }
        return k * LN2_HI - (hfsq - (s * (hfsq + R) + k * LN2_LO) - f);
      }
      if (k === 0) {
        return f - s * (f - R);
      }
      return k * LN2_HI - (s * (f - R) - k * LN2_LO - f);
    }
    module.exports = ln;
  }
});

// node_modules/@stdlib/math-base-special-ln/lib/index.js
var require_lib59 = __commonJS({
  "node_modules/@stdlib/math-base-special-ln/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main45();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p1q1.js
var require_rational_p1q1 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -5087819496582806e-19;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -5087819496582806e-19 + x * (-0.008368748197417368 + x * (0.03348066254097446 + x * (-0.012692614766297404 + x * (-0.03656379714117627 + x * (0.02198786811111689 + x * (0.008226878746769157 + x * (-0.005387729650712429 + x * (0 + x * 0))))))));
        s2 = 1 + x * (-0.9700050433032906 + x * (-1.5657455823417585 + x * (1.5622155839842302 + x * (0.662328840472003 + x * (-0.7122890234154284 + x * (-0.05273963823400997 + x * (0.07952836873415717 + x * (-0.0023339375937419 + x * 8862163904564247e-19))))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (0 + x * (-0.005387729650712429 + x * (0.008226878746769157 + x * (0.02198786811111689 + x * (-0.03656379714117627 + x * (-0.012692614766297404 + x * (0.03348066254097446 + x * (-0.008368748197417368 + x * -5087819496582806e-19))))))));
        s2 = 8862163904564247e-19 + x * (-0.0023339375937419 + x * (0.07952836873415717 + x * (-0.05273963823400997 + x * (-0.7122890234154284 + x * (0.662328840472003 + x * (1.5622155839842302 + x * (-1.5657455823417585 + x * (-0.9700050433032906 + x * 1))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p2q2.js
var require_rational_p2q2 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.20243350835593876;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.20243350835593876 + x * (0.10526468069939171 + x * (8.3705032834312 + x * (17.644729840837403 + x * (-18.851064805871424 + x * (-44.6382324441787 + x * (17.445385985570866 + x * (21.12946554483405 + x * -3.6719225470772936)))))));
        s2 = 1 + x * (6.242641248542475 + x * (3.971343795334387 + x * (-28.66081804998 + x * (-20.14326346804852 + x * (48.560921310873994 + x * (10.826866735546016 + x * (-22.643693341313973 + x * 1.7211476576120028)))))));
      } else {
        x = 1 / x;
        s1 = -3.6719225470772936 + x * (21.12946554483405 + x * (17.445385985570866 + x * (-44.6382324441787 + x * (-18.851064805871424 + x * (17.644729840837403 + x * (8.3705032834312 + x * (0.10526468069939171 + x * -0.20243350835593876)))))));
        s2 = 1.7211476576120028 + x * (-22.643693341313973 + x * (10.826866735546016 + x * (48.560921310873994 + x * (-20.14326346804852 + x * (-28.66081804998 + x * (3.971343795334387 + x * (6.242641248542475 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p3q3.js
var require_rational_p3q3 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.1311027816799519;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.1311027816799519 + x * (-0.16379404719331705 + x * (0.11703015634199525 + x * (0.38707973897260434 + x * (0.3377855389120359 + x * (0.14286953440815717 + x * (0.029015791000532906 + x * (0.0021455899538880526 + x * (-6794655751811263e-22 + x * (28522533178221704e-24 + x * -681149956853777e-24)))))))));
        s2 = 1 + x * (3.4662540724256723 + x * (5.381683457070069 + x * (4.778465929458438 + x * (2.5930192162362027 + x * (0.848854343457902 + x * (0.15226433829533179 + x * (0.011059242293464892 + x * (0 + x * (0 + x * 0)))))))));
      } else {
        x = 1 / x;
        s1 = -681149956853777e-24 + x * (28522533178221704e-24 + x * (-6794655751811263e-22 + x * (0.0021455899538880526 + x * (0.029015791000532906 + x * (0.14286953440815717 + x * (0.3377855389120359 + x * (0.38707973897260434 + x * (0.11703015634199525 + x * (-0.16379404719331705 + x * -0.1311027816799519)))))))));
        s2 = 0 + x * (0 + x * (0 + x * (0.011059242293464892 + x * (0.15226433829533179 + x * (0.848854343457902 + x * (2.5930192162362027 + x * (4.778465929458438 + x * (5.381683457070069 + x * (3.4662540724256723 + x * 1)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p4q4.js
var require_rational_p4q4 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p4q4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0350353787183178;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0350353787183178 + x * (-0.0022242652921344794 + x * (0.018557330651423107 + x * (0.009508047013259196 + x * (0.0018712349281955923 + x * (15754461742496055e-20 + x * (460469890584318e-20 + x * (-2304047769118826e-25 + x * 26633922742578204e-28)))))));
        s2 = 1 + x * (1.3653349817554064 + x * (0.7620591645536234 + x * (0.22009110576413124 + x * (0.03415891436709477 + x * (0.00263861676657016 + x * (7646752923027944e-20 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 26633922742578204e-28 + x * (-2304047769118826e-25 + x * (460469890584318e-20 + x * (15754461742496055e-20 + x * (0.0018712349281955923 + x * (0.009508047013259196 + x * (0.018557330651423107 + x * (-0.0022242652921344794 + x * -0.0350353787183178)))))));
        s2 = 0 + x * (0 + x * (7646752923027944e-20 + x * (0.00263861676657016 + x * (0.03415891436709477 + x * (0.22009110576413124 + x * (0.7620591645536234 + x * (1.3653349817554064 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/rational_p5q5.js
var require_rational_p5q5 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/rational_p5q5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.016743100507663373;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.016743100507663373 + x * (-0.0011295143874558028 + x * (0.001056288621524929 + x * (20938631748758808e-20 + x * (14962478375834237e-21 + x * (44969678992770644e-23 + x * (4625961635228786e-24 + x * (-2811287356288318e-29 + x * 9905570997331033e-32)))))));
        s2 = 1 + x * (0.5914293448864175 + x * (0.1381518657490833 + x * (0.016074608709367652 + x * (9640118070051656e-19 + x * (27533547476472603e-21 + x * (282243172016108e-21 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 9905570997331033e-32 + x * (-2811287356288318e-29 + x * (4625961635228786e-24 + x * (44969678992770644e-23 + x * (14962478375834237e-21 + x * (20938631748758808e-20 + x * (0.001056288621524929 + x * (-0.0011295143874558028 + x * -0.016743100507663373)))))));
        s2 = 0 + x * (0 + x * (282243172016108e-21 + x * (27533547476472603e-21 + x * (9640118070051656e-19 + x * (0.016074608709367652 + x * (0.1381518657490833 + x * (0.5914293448864175 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/main.js
var require_main46 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var ln = require_lib59();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var rationalFcnR1 = require_rational_p1q1();
    var rationalFcnR2 = require_rational_p2q2();
    var rationalFcnR3 = require_rational_p3q3();
    var rationalFcnR4 = require_rational_p4q4();
    var rationalFcnR5 = require_rational_p5q5();
    var Y1 = 0.08913147449493408;
    var Y2 = 2.249481201171875;
    var Y3 = 0.807220458984375;
    var Y4 = 0.9399557113647461;
    var Y5 = 0.9836282730102539;
    function erfinv(x) {
      var sign;
      var ax;
      var qs;
      var q;
      var g;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (x === 1) {
        return PINF;
      }
      if (x === -1) {
        return NINF;
      }
      if (x === 0) {
        return x;
      }
      if (x > 1 || x < -1) {
        return NaN;
      }
      if (x < 0) {
        sign = -1;
        ax = -x;
      } else {
        sign = 1;
        ax = x;
      }
      q = 1 - ax;
      if (ax <= 0.5) {
        g = ax * (ax + 10);
        r = rationalFcnR1(ax);
        return sign * (g * Y1 + g * r);
      }
      if (q >= 0.25) {
        g = sqrt(-2 * ln(q));
        q -= 0.25;
        r = rationalFcnR2(q);
        return sign * (g / (Y2 + r));
      }
      q = sqrt(-ln(q));
      if (q < 3) {
        qs = q - 1.125;
        r = rationalFcnR3(qs);
        return sign * (Y3 * q + r * q);
      }
      if (q < 6) {
        qs = q - 3;
        r = rationalFcnR4(qs);
        return sign * (Y4 * q + r * q);
      }
      qs = q - 6;
      r = rationalFcnR5(qs);
      return sign * (Y5 * q + r * q);
    }
    module.exports = erfinv;
  }
});

// node_modules/@stdlib/math-base-special-erfinv/lib/index.js
var require_lib60 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main46();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/main.js
var require_main47 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/main.js"(exports, module) {
    "use strict";
    var erfinv = require_lib60();
    var isnan = require_lib6();
    var sqrt = require_lib54();
    function quantile(p, mu, sigma) {
      var A;
      var B;
      if (isnan(mu) || isnan(sigma) || isnan(p) || sigma < 0 || p < 0 || p > 1) {
        return NaN;
      }
      if (sigma === 0) {
        return mu;
      }
      A = mu;
      B = sigma * sqrt(2);
      return A + B * erfinv(2 * p - 1);
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/main.js
var require_main48 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function quantile(p, mu) {
      if (isnan(p) || p < 0 || p > 1) {
        return NaN;
      }
      return mu;
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/factory.js
var require_factory3 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var isnan = require_lib6();
    function factory(mu) {
      if (isnan(mu)) {
        return constantFunction(NaN);
      }
      return quantile;
      function quantile(p) {
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        return mu;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/index.js
var require_lib61 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-degenerate-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main48();
    var factory = require_factory3();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/factory.js
var require_factory4 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var degenerate2 = require_lib61().factory;
    var erfinv = require_lib60();
    var isnan = require_lib6();
    var sqrt = require_lib54();
    function factory(mu, sigma) {
      var A;
      var B;
      if (isnan(mu) || isnan(sigma) || sigma < 0) {
        return constantFunction(NaN);
      }
      if (sigma === 0) {
        degenerate2(mu);
      }
      A = mu;
      B = sigma * sqrt(2);
      return quantile;
      function quantile(p) {
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        return A + B * erfinv(2 * p - 1);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-normal-quantile/lib/index.js
var require_lib62 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-normal-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main47();
    var factory = require_factory4();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-half-ln-two/lib/index.js
var require_lib63 = __commonJS({
  "node_modules/@stdlib/constants-float64-half-ln-two/lib/index.js"(exports, module) {
    "use strict";
    var HALF_LN2 = 0.34657359027997264;
    module.exports = HALF_LN2;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/polyval_q.js
var require_polyval_q2 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/polyval_q.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.03333333333333313;
      }
      return -0.03333333333333313 + x * (0.0015873015872548146 + x * (-793650757867488e-19 + x * (4008217827329362e-21 + x * -20109921818362437e-23)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/main.js
var require_main49 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var fromWords = require_lib43();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var FLOAT64_EXPONENT_BIAS = require_lib13();
    var HALF_LN2 = require_lib63();
    var polyval = require_polyval_q2();
    var OVERFLOW_THRESHOLD = 709.782712893384;
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var LN2_INV = 1.4426950408889634;
    var LN2x56 = 38.816242111356935;
    var LN2_HALFX3 = 1.0397207708399179;
    function expm1(x) {
      var halfX;
      var twopk;
      var sign;
      var hi2;
      var lo2;
      var hx;
      var r1;
      var y;
      var z;
      var c;
      var t;
      var e;
      var k;
      if (x === PINF || isnan(x)) {
        return x;
      }
      if (x === NINF) {
        return -1;
      }
      if (x === 0) {
        return x;
      }
      if (x < 0) {
        sign = true;
        y = -x;
      } else {
        sign = false;
        y = x;
      }
      if (y >= LN2x56) {
        if (sign) {
          return -1;
        }
        if (y >= OVERFLOW_THRESHOLD) {
          return PINF;
        }
      }
      hx = getHighWord(y) | 0;
      if (y > HALF_LN2) {
        if (y < LN2_HALFX3) {
          if (sign) {
            hi2 = x + LN2_HI;
            lo2 = -LN2_LO;
            k = -1;
          } else {
            hi2 = x - LN2_HI;
            lo2 = LN2_LO;
            k = 1;
          }
        } else {
          if (sign) {
            k = LN2_INV * x - 0.5;
          } else {
            k = LN2_INV * x + 0.5;
          }
          k |= 0;
          t = k;
          hi2 = x - t * LN2_HI;
          lo2 = t * LN2_LO;
        }
        x = hi2 - lo2;
        c = hi2 - x - lo2;
      } else if (hx < 1016070144) {
        return x;
      } else {
        k = 0;
      }
      halfX = 0.5 * x;
      z = x * halfX;
      r1 = 1 + z * polyval(z);
      t = 3 - r1 * halfX;
      e = z * ((r1 - t) / (6 - x * t));
      if (k === 0) {
        return x - (x * e - z);
      }
      twopk = fromWords(FLOAT64_EXPONENT_BIAS + k << 20, 0);
      e = x * (e - c) - c;
      e -= z;
      if (k === -1) {
        return 0.5 * (x - e) - 0.5;
      }
      if (k === 1) {
        if (x < -0.25) {
          return -2 * (e - (x + 0.5));
        }
        return 1 + 2 * (x - e);
      }
      if (k <= -2 || k > 56) {
        y = 1 - (e - x);
        if (k === 1024) {
          hi2 = getHighWord(y) + (k << 20) | 0;
          y = setHighWord(y, hi2);
        } else {
          y *= twopk;
        }
        return y - 1;
      }
      t = 1;
      if (k < 20) {
        hi2 = 1072693248 - (2097152 >> k) | 0;
        t = setHighWord(t, hi2);
        y = t - (e - x);
      } else {
        hi2 = FLOAT64_EXPONENT_BIAS - k << 20 | 0;
        t = setHighWord(t, hi2);
        y = x - (e + t);
        y += 1;
      }
      y *= twopk;
      return y;
    }
    module.exports = expm1;
  }
});

// node_modules/@stdlib/math-base-special-expm1/lib/index.js
var require_lib64 = __commonJS({
  "node_modules/@stdlib/math-base-special-expm1/lib/index.js"(exports, module) {
    "use strict";
    var expm1 = require_main49();
    module.exports = expm1;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/polyval_lp.js
var require_polyval_lp = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/polyval_lp.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6666666666666735;
      }
      return 0.6666666666666735 + x * (0.3999999999940942 + x * (0.2857142874366239 + x * (0.22222198432149784 + x * (0.1818357216161805 + x * (0.15313837699209373 + x * 0.14798198605116586)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/main.js
var require_main50 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var FLOAT64_EXPONENT_BIAS = require_lib13();
    var polyval = require_polyval_lp();
    var LN2_HI = 0.6931471803691238;
    var LN2_LO = 19082149292705877e-26;
    var SQRT2M1 = 0.41421356237309503;
    var SQRT2HALFM1 = -0.2928932188134525;
    var SMALL = 1862645149230957e-24;
    var TINY = 5551115123125783e-32;
    var TWO53 = 9007199254740992;
    var TWO_THIRDS = 0.6666666666666666;
    function log1p(x) {
      var hfsq;
      var hu;
      var y;
      var f;
      var c;
      var s;
      var z;
      var R;
      var u;
      var k;
      if (x < -1 || isnan(x)) {
        return NaN;
      }
      if (x === -1) {
        return NINF;
      }
      if (x === PINF) {
        return x;
      }
      if (x === 0) {
        return x;
      }
      if (x < 0) {
        y = -x;
      } else {
        y = x;
      }
      k = 1;
      if (y < SQRT2M1) {
        if (y < SMALL) {
          if (y < TINY) {
            return x;
          }
          return x - x * x * 0.5;
        }
        if (x > SQRT2HALFM1) {
          k = 0;
          f = x;
          hu = 1;
        }
      }
      if (k !== 0) {
        if (y < TWO53) {
          u = 1 + x;
          hu = getHighWord(u);
          k = (hu >> 20) - FLOAT64_EXPONENT_BIAS;
          if (k > 0) {
            c = 1 - (u - x);
          } else {
            c = x - (u - 1);
          }
          c /= u;
        } else {
          u = x;
          hu = getHighWord(u);
          k = (hu >> 20) - FLOAT64_EXPONENT_BIAS;
          c = 0;
        }
        hu &= 1048575;
        if (hu < 434334) {
          u = setHighWord(u, hu | 1072693248);
        } else {
          k += 1;
          u = setHighWord(u, hu | 1071644672);
          hu = 1048576 - hu >> 2;
        }
        f = u - 1;
      }
      hfsq = 0.5 * f * f;
      if (hu === 0) {
        if (f === 0) {
          c += k * LN2_LO;
          return k * LN2_HI + c;
        }
        R = hfsq * (1 - TWO_THIRDS * f);
        return k * LN2_HI - (R - (k * LN2_LO + c) - f);
      }
      s = f / (2 + f);
      z = s * s;
      R = z * polyval(z);
      if (k === 0) {
        return f - (hfsq - s * (hfsq + R));
      }
      return k * LN2_HI - (hfsq - (s * (hfsq + R) + (k * LN2_LO + c)) - f);
    }
    module.exports = log1p;
  }
});

// node_modules/@stdlib/math-base-special-log1p/lib/index.js
var require_lib65 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1p/lib/index.js"(exports, module) {
    "use strict";
    var log1p = require_main50();
    module.exports = log1p;
  }
});

// node_modules/@stdlib/constants-float64-fourth-pi/lib/index.js
var require_lib66 = __commonJS({
  "node_modules/@stdlib/constants-float64-fourth-pi/lib/index.js"(exports, module) {
    "use strict";
    var FOURTH_PI = 0.7853981633974483;
    module.exports = FOURTH_PI;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/rational_pq.js
var require_rational_pq = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.16666666666666713;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -8.198089802484825 + x * (19.562619833175948 + x * (-16.262479672107002 + x * (5.444622390564711 + x * (-0.6019598008014124 + x * 0.004253011369004428))));
        s2 = -49.18853881490881 + x * (139.51056146574857 + x * (-147.1791292232726 + x * (70.49610280856842 + x * (-14.740913729888538 + x * 1))));
      } else {
        x = 1 / x;
        s1 = 0.004253011369004428 + x * (-0.6019598008014124 + x * (5.444622390564711 + x * (-16.262479672107002 + x * (19.562619833175948 + x * -8.198089802484825))));
        s2 = 1 + x * (-14.740913729888538 + x * (70.49610280856842 + x * (-147.1791292232726 + x * (139.51056146574857 + x * -49.18853881490881))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/rational_rs.js
var require_rational_rs = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/rational_rs.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.08333333333333809;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 28.536655482610616 + x * (-25.56901049652825 + x * (6.968710824104713 + x * (-0.5634242780008963 + x * 0.002967721961301243)));
        s2 = 342.43986579130785 + x * (-383.8770957603691 + x * (147.0656354026815 + x * (-21.947795316429207 + x * 1)));
      } else {
        x = 1 / x;
        s1 = 0.002967721961301243 + x * (-0.5634242780008963 + x * (6.968710824104713 + x * (-25.56901049652825 + x * 28.536655482610616)));
        s2 = 1 + x * (-21.947795316429207 + x * (147.0656354026815 + x * (-383.8770957603691 + x * 342.43986579130785)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/main.js
var require_main51 = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var PIO4 = require_lib66();
    var ratevalPQ = require_rational_pq();
    var ratevalRS = require_rational_rs();
    var MOREBITS = 6123233995736766e-32;
    function asin(x) {
      var sgn;
      var zz;
      var a;
      var p;
      var z;
      if (isnan(x)) {
        return NaN;
      }
      if (x > 0) {
        a = x;
      } else {
        sgn = true;
        a = -x;
      }
      if (a > 1) {
        return NaN;
      }
      if (a > 0.625) {
        zz = 1 - a;
        p = zz * ratevalRS(zz);
        zz = sqrt(zz + zz);
        z = PIO4 - zz;
        zz = zz * p - MOREBITS;
        z -= zz;
        z += PIO4;
      } else {
        if (a < 1e-8) {
          return x;
        }
        zz = a * a;
        z = zz * ratevalPQ(zz);
        z = a * z + a;
      }
      return sgn ? -z : z;
    }
    module.exports = asin;
  }
});

// node_modules/@stdlib/math-base-special-asin/lib/index.js
var require_lib67 = __commonJS({
  "node_modules/@stdlib/math-base-special-asin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main51();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-integer/lib/main.js
var require_main52 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-integer/lib/main.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    function isInteger(x) {
      return floor(x) === x;
    }
    module.exports = isInteger;
  }
});

// node_modules/@stdlib/math-base-assert-is-integer/lib/index.js
var require_lib68 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-integer/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main52();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-even/lib/main.js
var require_main53 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-even/lib/main.js"(exports, module) {
    "use strict";
    var isInteger = require_lib68();
    function isEven(x) {
      return isInteger(x / 2);
    }
    module.exports = isEven;
  }
});

// node_modules/@stdlib/math-base-assert-is-even/lib/index.js
var require_lib69 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-even/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main53();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-odd/lib/main.js
var require_main54 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-odd/lib/main.js"(exports, module) {
    "use strict";
    var isEven = require_lib69();
    function isOdd(x) {
      if (x > 0) {
        return isEven(x - 1);
      }
      return isEven(x + 1);
    }
    module.exports = isOdd;
  }
});

// node_modules/@stdlib/math-base-assert-is-odd/lib/index.js
var require_lib70 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-odd/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main54();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-uint32-base-to-int32/lib/main.js
var require_main55 = __commonJS({
  "node_modules/@stdlib/number-uint32-base-to-int32/lib/main.js"(exports, module) {
    "use strict";
    function uint32ToInt32(x) {
      return x | 0;
    }
    module.exports = uint32ToInt32;
  }
});

// node_modules/@stdlib/number-uint32-base-to-int32/lib/index.js
var require_lib71 = __commonJS({
  "node_modules/@stdlib/number-uint32-base-to-int32/lib/index.js"(exports, module) {
    "use strict";
    var uint32ToInt32 = require_main55();
    module.exports = uint32ToInt32;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/x_is_zero.js
var require_x_is_zero = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/x_is_zero.js"(exports, module) {
    "use strict";
    var isOdd = require_lib70();
    var copysign = require_lib44();
    var NINF = require_lib11();
    var PINF = require_lib12();
    function pow(x, y) {
      if (y === NINF) {
        return PINF;
      }
      if (y === PINF) {
        return 0;
      }
      if (y > 0) {
        if (isOdd(y)) {
          return x;
        }
        return 0;
      }
      if (isOdd(y)) {
        return copysign(PINF, x);
      }
      return PINF;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/y_is_huge.js
var require_y_is_huge = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/y_is_huge.js"(exports, module) {
    "use strict";
    var ABS_MASK = require_lib19();
    var getHighWord = require_lib42();
    var HIGH_MAX_NEAR_UNITY = 1072693247 | 0;
    var HUGE = 1e300;
    var TINY = 1e-300;
    function pow(x, y) {
      var ahx;
      var hx;
      hx = getHighWord(x);
      ahx = hx & ABS_MASK;
      if (ahx <= HIGH_MAX_NEAR_UNITY) {
        if (y < 0) {
          return HUGE * HUGE;
        }
        return TINY * TINY;
      }
      if (y > 0) {
        return HUGE * HUGE;
      }
      return TINY * TINY;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/y_is_infinite.js
var require_y_is_infinite = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/y_is_infinite.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var PINF = require_lib12();
    function pow(x, y) {
      if (x === -1) {
        return (x - x) / (x - x);
      }
      if (x === 1) {
        return 1;
      }
      if (abs(x) < 1 === (y === PINF)) {
        return 0;
      }
      return PINF;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/constants-float64-num-high-word-significand-bits/lib/index.js
var require_lib72 = __commonJS({
  "node_modules/@stdlib/constants-float64-num-high-word-significand-bits/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_NUM_HIGH_WORD_SIGNIFICAND_BITS = 20 | 0;
    module.exports = FLOAT64_NUM_HIGH_WORD_SIGNIFICAND_BITS;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_l.js
var require_polyval_l = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_l.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.5999999999999946;
      }
      return 0.5999999999999946 + x * (0.4285714285785502 + x * (0.33333332981837743 + x * (0.272728123808534 + x * (0.23066074577556175 + x * 0.20697501780033842))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/log2ax.js
var require_log2ax = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/log2ax.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setLowWord = require_lib52();
    var setHighWord = require_lib58();
    var BIAS = require_lib13();
    var HIGH_NUM_SIGNIFICAND_BITS = require_lib72();
    var polyvalL = require_polyval_l();
    var HIGH_SIGNIFICAND_MASK = 1048575 | 0;
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    var HIGH_BIASED_EXP_NEG_512 = 536870912 | 0;
    var HIGH_SIGNIFICAND_HALF = 524288 | 0;
    var TWO53 = 9007199254740992;
    var CP = 0.9617966939259756;
    var CP_HI = 0.9617967009544373;
    var CP_LO = -7028461650952758e-24;
    var BP = [
      1,
      1.5
    ];
    var DP_HI = [
      0,
      0.5849624872207642
      // 0x3FE2B803, 0x40000000
    ];
    var DP_LO = [
      0,
      1350039202129749e-23
      // 0x3E4CFDEB, 0x43CFD006
    ];
    function log2ax(out, ax, ahx) {
      var tmp;
      var ss;
      var s2;
      var hs;
      var ls;
      var ht;
      var lt;
      var bp;
      var dp;
      var hp;
      var lp;
      var hz;
      var lz;
      var t1;
      var t2;
      var t;
      var r;
      var u;
      var v;
      var n;
      var j;
      var k;
      n = 0 | 0;
      if (ahx < HIGH_MIN_NORMAL_EXP) {
        ax *= TWO53;
        n -= 53 | 0;
        ahx = getHighWord(ax);
      }
      n += (ahx >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
      j = ahx & HIGH_SIGNIFICAND_MASK | 0;
      ahx = j | HIGH_BIASED_EXP_0 | 0;
      if (j <= 235662) {
        k = 0;
      } else if (j < 767610) {
        k = 1;
      } else {
        k = 0;
        n += 1 | 0;
        ahx -= HIGH_MIN_NORMAL_EXP;
      }
      ax = setHighWord(ax, ahx);
      bp = BP[k];
      u = ax - bp;
      v = 1 / (ax + bp);
      ss = u * v;
      hs = setLowWord(ss, 0);
      tmp = (ahx >> 1 | HIGH_BIASED_EXP_NEG_512) + HIGH_SIGNIFICAND_HALF;
      tmp += k << 18;
      ht = setHighWord(0, tmp);
      lt = ax - (ht - bp);
      ls = v * (u - hs * ht - hs * lt);
      s2 = ss * ss;
      r = s2 * s2 * polyvalL(s2);
      r += ls * (hs + ss);
      s2 = hs * hs;
      ht = 3 + s2 + r;
      ht = setLowWord(ht, 0);
      lt = r - (ht - 3 - s2);
      u = hs * ht;
      v = ls * ht + lt * ss;
      hp = u + v;
      hp = setLowWord(hp, 0);
      lp = v - (hp - u);
      hz = CP_HI * hp;
      lz = CP_LO * hp + lp * CP + DP_LO[k];
      dp = DP_HI[k];
      t = n;
      t1 = hz + lz + dp + t;
      t1 = setLowWord(t1, 0);
      t2 = lz - (t1 - t - dp - hz);
      out[0] = t1;
      out[1] = t2;
      return out;
    }
    module.exports = log2ax;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_w.js
var require_polyval_w = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_w.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.5;
      }
      return 0.5 + x * (-0.3333333333333333 + x * 0.25);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/logx.js
var require_logx = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/logx.js"(exports, module) {
    "use strict";
    var setLowWord = require_lib52();
    var polyvalW = require_polyval_w();
    var INV_LN2 = 1.4426950408889634;
    var INV_LN2_HI = 1.4426950216293335;
    var INV_LN2_LO = 19259629911266175e-24;
    function logx(out, ax) {
      var t2;
      var t1;
      var t;
      var w;
      var u;
      var v;
      t = ax - 1;
      w = t * t * polyvalW(t);
      u = INV_LN2_HI * t;
      v = t * INV_LN2_LO - w * INV_LN2;
      t1 = u + v;
      t1 = setLowWord(t1, 0);
      t2 = v - (t1 - u);
      out[0] = t1;
      out[1] = t2;
      return out;
    }
    module.exports = logx;
  }
});

// node_modules/@stdlib/constants-float64-ln-two/lib/index.js
var require_lib73 = __commonJS({
  "node_modules/@stdlib/constants-float64-ln-two/lib/index.js"(exports, module) {
    "use strict";
    var LN2 = 0.6931471805599453;
    module.exports = LN2;
  }
});

// node_modules/@stdlib/constants-float64-high-word-significand-mask/lib/index.js
var require_lib74 = __commonJS({
  "node_modules/@stdlib/constants-float64-high-word-significand-mask/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_HIGH_WORD_SIGNIFICAND_MASK = 1048575;
    module.exports = FLOAT64_HIGH_WORD_SIGNIFICAND_MASK;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/polyval_p.js
var require_polyval_p3 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/polyval_p.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666602;
      }
      return 0.16666666666666602 + x * (-0.0027777777777015593 + x * (6613756321437934e-20 + x * (-16533902205465252e-22 + x * 41381367970572385e-24)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/pow2.js
var require_pow2 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/pow2.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var setHighWord = require_lib58();
    var setLowWord = require_lib52();
    var uint32ToInt32 = require_lib71();
    var ldexp = require_lib50();
    var LN2 = require_lib73();
    var BIAS = require_lib13();
    var ABS_MASK = require_lib19();
    var HIGH_SIGNIFICAND_MASK = require_lib74();
    var HIGH_NUM_SIGNIFICAND_BITS = require_lib72();
    var polyvalP = require_polyval_p3();
    var HIGH_MIN_NORMAL_EXP = 1048576 | 0;
    var HIGH_BIASED_EXP_NEG_1 = 1071644672 | 0;
    var LN2_HI = 0.6931471824645996;
    var LN2_LO = -1904654299957768e-24;
    function pow2(j, hp, lp) {
      var tmp;
      var t1;
      var t;
      var r;
      var u;
      var v;
      var w;
      var z;
      var n;
      var i;
      var k;
      i = j & ABS_MASK | 0;
      k = (i >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
      n = 0;
      if (i > HIGH_BIASED_EXP_NEG_1) {
        n = j + (HIGH_MIN_NORMAL_EXP >> k + 1) >>> 0;
        k = ((n & ABS_MASK) >> HIGH_NUM_SIGNIFICAND_BITS) - BIAS | 0;
        tmp = (n & ~(HIGH_SIGNIFICAND_MASK >> k)) >>> 0;
        t = setHighWord(0, tmp);
        n = (n & HIGH_SIGNIFICAND_MASK | HIGH_MIN_NORMAL_EXP) >> HIGH_NUM_SIGNIFICAND_BITS - k >>> 0;
        if (j < 0) {
          n = -n;
        }
        hp -= t;
      }
      t = lp + hp;
      t = setLowWord(t, 0);
      u = t * LN2_HI;
      v = (lp - (t - hp)) * LN2 + t * LN2_LO;
      z = u + v;
      w = v - (z - u);
      t = z * z;
      t1 = z - t * polyvalP(t);
      r = z * t1 / (t1 - 2) - (w + z * w);
      z = 1 - (r - z);
      j = getHighWord(z);
      j = uint32ToInt32(j);
      j += n << HIGH_NUM_SIGNIFICAND_BITS >>> 0;
      if (j >> HIGH_NUM_SIGNIFICAND_BITS <= 0) {
        z = ldexp(z, n);
      } else {
        z = setHighWord(z, j);
      }
      return z;
    }
    module.exports = pow2;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/main.js
var require_main56 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isOdd = require_lib70();
    var isInfinite = require_lib17();
    var isInteger = require_lib68();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var toWords = require_lib41();
    var setLowWord = require_lib52();
    var uint32ToInt32 = require_lib71();
    var NINF = require_lib11();
    var PINF = require_lib12();
    var ABS_MASK = require_lib19();
    var xIsZero = require_x_is_zero();
    var yIsHuge = require_y_is_huge();
    var yIsInfinite = require_y_is_infinite();
    var log2ax = require_log2ax();
    var logx = require_logx();
    var pow2 = require_pow2();
    var HIGH_MAX_NEAR_UNITY = 1072693247 | 0;
    var HIGH_BIASED_EXP_31 = 1105199104 | 0;
    var HIGH_BIASED_EXP_64 = 1139802112 | 0;
    var HIGH_BIASED_EXP_10 = 1083179008 | 0;
    var HIGH_BIASED_EXP_0 = 1072693248 | 0;
    var HIGH_1075 = 1083231232 | 0;
    var HIGH_NEG_1075 = 3230714880 >>> 0;
    var HIGH_NUM_NONSIGN_BITS = 31 | 0;
    var HUGE = 1e300;
    var TINY = 1e-300;
    var OVT = 8008566259537294e-32;
    var WORDS = [0 | 0, 0 | 0];
    var LOG_WORKSPACE = [0, 0];
    function pow(x, y) {
      var ahx;
      var ahy;
      var ax;
      var hx;
      var lx;
      var hy;
      var ly;
      var sx;
      var sy;
      var y1;
      var hp;
      var lp;
      var t;
      var z;
      var j;
      var i;
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      toWords.assign(y, WORDS, 1, 0);
      hy = WORDS[0];
      ly = WORDS[1];
      if (ly === 0) {
        if (y === 0) {
          return 1;
        }
        if (y === 1) {
          return x;
        }
        if (y === -1) {
          return 1 / x;
        }
        if (y === 0.5) {
          return sqrt(x);
        }
        if (y === -0.5) {
          return 1 / sqrt(x);
        }
        if (y === 2) {
          return x * x;
        }
        if (y === 3) {
          return x * x * x;
        }
        if (y === 4) {
          x *= x;
          return x * x;
        }
        if (isInfinite(y)) {
          return yIsInfinite(x, y);
        }
      }
      toWords.assign(x, WORDS, 1, 0);
      hx = WORDS[0];
      lx = WORDS[1];
      if (lx === 0) {
        if (hx === 0) {
          return xIsZero(x, y);
        }
        if (x === 1) {
          return 1;
        }
        if (x === -1 && isOdd(y)) {
          return -1;
        }
        if (isInfinite(x)) {
          if (x === NINF) {
            return pow(-0, -y);
          }
          if (y < 0) {
            return 0;
          }
          return PINF;
        }
      }
      if (x < 0 && isInteger(y) === false) {
        return (x - x) / (x - x);
      }
      ax = abs(x);
      ahx = hx & ABS_MASK | 0;
      ahy = hy & ABS_MASK | 0;
      sx = hx >>> HIGH_NUM_NONSIGN_BITS | 0;
      sy = hy >>> HIGH_NUM_NONSIGN_BITS | 0;
      if (sx && isOdd(y)) {
        sx = -1;
      } else {
        sx = 1;
      }
      if (ahy > HIGH_BIASED_EXP_31) {
        if (ahy > HIGH_BIASED_EXP_64) {
          return yIsHuge(x, y);
        }
        if (ahx < HIGH_MAX_NEAR_UNITY) {
          if (sy === 1) {
            return sx * HUGE * HUGE;
          }
          return sx * TINY * TINY;
        }
        if (ahx > HIGH_BIASED_EXP_0) {
          if (sy === 0) {
            return sx * HUGE * HUGE;
          }
          return sx * TINY * TINY;
        }
        t = logx(LOG_WORKSPACE, ax);
      } else {
        t = log2ax(LOG_WORKSPACE, ax, ahx);
      }
      y1 = setLowWord(y, 0);
      lp = (y - y1) * t[0] + y * t[1];
      hp = y1 * t[0];
      z = lp + hp;
      toWords.assign(z, WORDS, 1, 0);
      j = uint32ToInt32(WORDS[0]);
      i = uint32ToInt32(WORDS[1]);
      if (j >= HIGH_BIASED_EXP_10) {
        if ((j - HIGH_BIASED_EXP_10 | i) !== 0) {
          return sx * HUGE * HUGE;
        }
        if (lp + OVT > z - hp) {
          return sx * HUGE * HUGE;
        }
      } else if ((j & ABS_MASK) >= HIGH_1075) {
        if ((j - HIGH_NEG_1075 | i) !== 0) {
          return sx * TINY * TINY;
        }
        if (lp <= z - hp) {
          return sx * TINY * TINY;
        }
      }
      z = pow2(j, hp, lp);
      return sx * z;
    }
    module.exports = pow;
  }
});

// node_modules/@stdlib/math-base-special-pow/lib/index.js
var require_lib75 = __commonJS({
  "node_modules/@stdlib/math-base-special-pow/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main56();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-e/lib/index.js
var require_lib76 = __commonJS({
  "node_modules/@stdlib/constants-float64-e/lib/index.js"(exports, module) {
    "use strict";
    var E = 2.718281828459045;
    module.exports = E;
  }
});

// node_modules/@stdlib/constants-float64-eps/lib/index.js
var require_lib77 = __commonJS({
  "node_modules/@stdlib/constants-float64-eps/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_EPSILON = 2220446049250313e-31;
    module.exports = FLOAT64_EPSILON;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/lanczos_sum_expg_scaled.js
var require_lanczos_sum_expg_scaled = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/lanczos_sum_expg_scaled.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 709811.662581658 + x * (679979.8474157227 + x * (293136.7857211597 + x * (74887.54032914672 + x * (12555.290582413863 + x * (1443.4299244417066 + x * (115.24194596137347 + x * (6.309239205732627 + x * (0.22668404630224365 + x * (0.004826466289237662 + x * 4624429436045379e-20)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 4624429436045379e-20 + x * (0.004826466289237662 + x * (0.22668404630224365 + x * (6.309239205732627 + x * (115.24194596137347 + x * (1443.4299244417066 + x * (12555.290582413863 + x * (74887.54032914672 + x * (293136.7857211597 + x * (679979.8474157227 + x * 709811.662581658)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/main.js
var require_main57 = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var E = require_lib76();
    var EPSILON = require_lib77();
    var lanczosSumExpGScaled = require_lanczos_sum_expg_scaled();
    var G = 10.900511;
    function beta(a, b) {
      var ambh;
      var agh;
      var bgh;
      var cgh;
      var res;
      var tmp;
      var c;
      if (isnan(a) || isnan(b)) {
        return NaN;
      }
      if (a < 0 || b < 0) {
        return NaN;
      }
      if (b === 1) {
        return 1 / a;
      }
      if (a === 1) {
        return 1 / b;
      }
      c = a + b;
      if (c < EPSILON) {
        res = c / a;
        res /= b;
        return res;
      }
      if (c === a && b < EPSILON) {
        return 1 / b;
      }
      if (c === b && a < EPSILON) {
        return 1 / a;
      }
      if (a < b) {
        tmp = b;
        b = a;
        a = tmp;
      }
      agh = a + G - 0.5;
      bgh = b + G - 0.5;
      cgh = c + G - 0.5;
      res = lanczosSumExpGScaled(a) * (lanczosSumExpGScaled(b) / lanczosSumExpGScaled(c));
      ambh = a - 0.5 - b;
      if (abs(b * ambh) < cgh * 100 && a > 100) {
        res *= exp(ambh * log1p(-b / cgh));
      } else {
        res *= pow(agh / cgh, ambh);
      }
      if (cgh > 1e10) {
        res *= pow(agh / cgh * (bgh / cgh), b);
      } else {
        res *= pow(agh * bgh / (cgh * cgh), b);
      }
      res *= sqrt(E / bgh);
      return res;
    }
    module.exports = beta;
  }
});

// node_modules/@stdlib/math-base-special-beta/lib/index.js
var require_lib78 = __commonJS({
  "node_modules/@stdlib/math-base-special-beta/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main57();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-assert-is-positive-zero/lib/main.js
var require_main58 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-positive-zero/lib/main.js"(exports, module) {
    "use strict";
    var PINF = require_lib12();
    function isPositiveZero(x) {
      return x === 0 && 1 / x === PINF;
    }
    module.exports = isPositiveZero;
  }
});

// node_modules/@stdlib/math-base-assert-is-positive-zero/lib/index.js
var require_lib79 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-positive-zero/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main58();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-max/lib/main.js
var require_main59 = __commonJS({
  "node_modules/@stdlib/math-base-special-max/lib/main.js"(exports, module) {
    "use strict";
    var isPositiveZero = require_lib79();
    var isnan = require_lib6();
    var PINF = require_lib12();
    function max(x, y) {
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      if (x === PINF || y === PINF) {
        return PINF;
      }
      if (x === y && x === 0) {
        if (isPositiveZero(x)) {
          return x;
        }
        return y;
      }
      if (x > y) {
        return x;
      }
      return y;
    }
    module.exports = max;
  }
});

// node_modules/@stdlib/math-base-special-max/lib/index.js
var require_lib80 = __commonJS({
  "node_modules/@stdlib/math-base-special-max/lib/index.js"(exports, module) {
    "use strict";
    var max = require_main59();
    module.exports = max;
  }
});

// node_modules/@stdlib/math-base-assert-is-negative-zero/lib/main.js
var require_main60 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-negative-zero/lib/main.js"(exports, module) {
    "use strict";
    var NINF = require_lib11();
    function isNegativeZero(x) {
      return x === 0 && 1 / x === NINF;
    }
    module.exports = isNegativeZero;
  }
});

// node_modules/@stdlib/math-base-assert-is-negative-zero/lib/index.js
var require_lib81 = __commonJS({
  "node_modules/@stdlib/math-base-assert-is-negative-zero/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main60();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-min/lib/main.js
var require_main61 = __commonJS({
  "node_modules/@stdlib/math-base-special-min/lib/main.js"(exports, module) {
    "use strict";
    var isNegativeZero = require_lib81();
    var isnan = require_lib6();
    var NINF = require_lib11();
    function min(x, y) {
      if (isnan(x) || isnan(y)) {
        return NaN;
      }
      if (x === NINF || y === NINF) {
        return NINF;
      }
      if (x === y && x === 0) {
        if (isNegativeZero(x)) {
          return x;
        }
        return y;
      }
      if (x < y) {
        return x;
      }
      return y;
    }
    module.exports = min;
  }
});

// node_modules/@stdlib/math-base-special-min/lib/index.js
var require_lib82 = __commonJS({
  "node_modules/@stdlib/math-base-special-min/lib/index.js"(exports, module) {
    "use strict";
    var min = require_main61();
    module.exports = min;
  }
});

// node_modules/@stdlib/constants-float64-max/lib/index.js
var require_lib83 = __commonJS({
  "node_modules/@stdlib/constants-float64-max/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX = 17976931348623157e292;
    module.exports = FLOAT64_MAX;
  }
});

// node_modules/@stdlib/constants-int32-max/lib/index.js
var require_lib84 = __commonJS({
  "node_modules/@stdlib/constants-int32-max/lib/index.js"(exports, module) {
    "use strict";
    var INT32_MAX = 2147483647 | 0;
    module.exports = INT32_MAX;
  }
});

// node_modules/@stdlib/constants-float64-half-pi/lib/index.js
var require_lib85 = __commonJS({
  "node_modules/@stdlib/constants-float64-half-pi/lib/index.js"(exports, module) {
    "use strict";
    var HALF_PI = 1.5707963267948966;
    module.exports = HALF_PI;
  }
});

// node_modules/@stdlib/constants-float64-pi/lib/index.js
var require_lib86 = __commonJS({
  "node_modules/@stdlib/constants-float64-pi/lib/index.js"(exports, module) {
    "use strict";
    var PI = 3.141592653589793;
    module.exports = PI;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c13.js
var require_polyval_c13 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c13.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0416666666666666;
      }
      return 0.0416666666666666 + x * (-0.001388888888887411 + x * 2480158728947673e-20);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c46.js
var require_polyval_c46 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/polyval_c46.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -27557314351390663e-23;
      }
      return -27557314351390663e-23 + x * (2087572321298175e-24 + x * -11359647557788195e-27);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/main.js
var require_main62 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/main.js"(exports, module) {
    "use strict";
    var polyval13 = require_polyval_c13();
    var polyval46 = require_polyval_c46();
    function kernelCos(x, y) {
      var hz;
      var r;
      var w;
      var z;
      z = x * x;
      w = z * z;
      r = z * polyval13(z);
      r += w * w * polyval46(z);
      hz = 0.5 * z;
      w = 1 - hz;
      return w + (1 - w - hz + (z * r - x * y));
    }
    module.exports = kernelCos;
  }
});

// node_modules/@stdlib/math-base-special-kernel-cos/lib/index.js
var require_lib87 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-cos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main62();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-sin/lib/main.js
var require_main63 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-sin/lib/main.js"(exports, module) {
    "use strict";
    var S1 = -0.16666666666666632;
    var S2 = 0.00833333333332249;
    var S3 = -1984126982985795e-19;
    var S4 = 27557313707070068e-22;
    var S5 = -25050760253406863e-24;
    var S6 = 158969099521155e-24;
    function kernelSin(x, y) {
      var r;
      var v;
      var w;
      var z;
      z = x * x;
      w = z * z;
      r = S2 + z * (S3 + z * S4) + z * w * (S5 + z * S6);
      v = z * x;
      if (y === 0) {
        return x + v * (S1 + z * r);
      }
      return x - (z * (0.5 * y - v * r) - y - v * S1);
    }
    module.exports = kernelSin;
  }
});

// node_modules/@stdlib/math-base-special-kernel-sin/lib/index.js
var require_lib88 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-sin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main63();
    module.exports = main2;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/low.js
var require_low2 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/low.js"(exports, module) {
    "use strict";
    var isLittleEndian = require_lib40();
    var LOW;
    if (isLittleEndian === true) {
      LOW = 0;
    } else {
      LOW = 1;
    }
    module.exports = LOW;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/main.js
var require_main64 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/main.js"(exports, module) {
    "use strict";
    var Uint32Array2 = require_lib28();
    var Float64Array2 = require_lib31();
    var LOW = require_low2();
    var FLOAT64_VIEW = new Float64Array2(1);
    var UINT32_VIEW = new Uint32Array2(FLOAT64_VIEW.buffer);
    function getLowWord(x) {
      FLOAT64_VIEW[0] = x;
      return UINT32_VIEW[LOW];
    }
    module.exports = getLowWord;
  }
});

// node_modules/@stdlib/number-float64-base-get-low-word/lib/index.js
var require_lib89 = __commonJS({
  "node_modules/@stdlib/number-float64-base-get-low-word/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main64();
    module.exports = main2;
  }
});

// node_modules/@stdlib/array-base-filled/lib/main.js
var require_main65 = __commonJS({
  "node_modules/@stdlib/array-base-filled/lib/main.js"(exports, module) {
    "use strict";
    function filled(value, len) {
      var arr;
      var i;
      arr = [];
      for (i = 0; i < len; i++) {
        arr.push(value);
      }
      return arr;
    }
    module.exports = filled;
  }
});

// node_modules/@stdlib/array-base-filled/lib/index.js
var require_lib90 = __commonJS({
  "node_modules/@stdlib/array-base-filled/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main65();
    module.exports = main2;
  }
});

// node_modules/@stdlib/array-base-zeros/lib/main.js
var require_main66 = __commonJS({
  "node_modules/@stdlib/array-base-zeros/lib/main.js"(exports, module) {
    "use strict";
    var filled = require_lib90();
    function zeros(len) {
      return filled(0, len);
    }
    module.exports = zeros;
  }
});

// node_modules/@stdlib/array-base-zeros/lib/index.js
var require_lib91 = __commonJS({
  "node_modules/@stdlib/array-base-zeros/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main66();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/kernel_rempio2.js
var require_kernel_rempio2 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/kernel_rempio2.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var ldexp = require_lib50();
    var zeros = require_lib91();
    var IPIO2 = [
      10680707,
      7228996,
      1387004,
      2578385,
      16069853,
      12639074,
      9804092,
      4427841,
      16666979,
      11263675,
      12935607,
      2387514,
      4345298,
      14681673,
      3074569,
      13734428,
      16653803,
      1880361,
      10960616,
      8533493,
      3062596,
      8710556,
      7349940,
      6258241,
      3772886,
      3769171,
      3798172,
      8675211,
      12450088,
      3874808,
      9961438,
      366607,
      15675153,
      9132554,
      7151469,
      3571407,
      2607881,
      12013382,
      4155038,
      6285869,
      7677882,
      13102053,
      15825725,
      473591,
      9065106,
      15363067,
      6271263,
      9264392,
      5636912,
      4652155,
      7056368,
      13614112,
      10155062,
      1944035,
      9527646,
      15080200,
      6658437,
      6231200,
      6832269,
      16767104,
      5075751,
      3212806,
      1398474,
      7579849,
      6349435,
      12618859
    ];
    var PIO2 = [
      1.570796251296997,
      // 0x3FF921FB, 0x40000000
      7549789415861596e-23,
      // 0x3E74442D, 0x00000000
      5390302529957765e-30,
      // 0x3CF84698, 0x80000000
      3282003415807913e-37,
      // 0x3B78CC51, 0x60000000
      1270655753080676e-44,
      // 0x39F01B83, 0x80000000
      12293330898111133e-52,
      // 0x387A2520, 0x40000000
      27337005381646456e-60,
      // 0x36E38222, 0x80000000
      21674168387780482e-67
      // 0x3569F31D, 0x00000000
    ];
    var TWO24 = 16777216;
    var TWON24 = 5960464477539063e-23;
    var F = zeros(20);
    var Q = zeros(20);
    var FQ = zeros(20);
    var IQ = zeros(20);
    function compute(x, y, jz, q, q0, jk, jv, jx, f) {
      var carry;
      var fw;
      var ih;
      var jp;
      var i;
      var k;
      var n;
      var j;
      var z;
      jp = jk;
      z = q[jz];
      j = jz;
      for (i = 0; j > 0; i++) {
        fw = TWON24 * z | 0;
        IQ[i] = z - TWO24 * fw | 0;
        z = q[j - 1] + fw;
        j -= 1;
      }
      z = ldexp(z, q0);
      z -= 8 * floor(z * 0.125);
      n = z | 0;
      z -= n;
      ih = 0;
      if (q0 > 0) {
        i = IQ[jz - 1] >> 24 - q0;
        n += i;
        IQ[jz - 1] -= i << 24 - q0;
        ih = IQ[jz - 1] >> 23 - q0;
      } else if (q0 === 0) {
        ih = IQ[jz - 1] >> 23;
      } else if (z >= 0.5) {
        ih = 2;
      }
      if (ih > 0) {
        n += 1;
        carry = 0;
        for (i = 0; i < jz; i++) {
          j = IQ[i];
          if (carry === 0) {
            if (j !== 0) {
              carry = 1;
              IQ[i] = 16777216 - j;
            }
          } else {
            IQ[i] = 16777215 - j;
          }
        }
        if (q0 > 0) {
          switch (q0) {
            // eslint-disable-line default-case
            case 1:
              IQ[jz - 1] &= 8388607;
              break;
            case 2:
              IQ[jz - 1] &= 4194303;
              break;
          }
        }
        if (ih === 2) {
          z = 1 - z;
          if (carry !== 0) {
            z -= ldexp(1, q0);
          }
        }
      }
      if (z === 0) {
        j = 0;
        for (i = jz - 1; i >= jk; i--) {
          j |= IQ[i];
        }
        if (j === 0) {
          for (k = 1; IQ[jk - k] === 0; k++) {
          }
          for (i = jz + 1; i <= jz + k; i++) {
            f[jx + i] = IPIO2[jv + i];
            fw = 0;
            for (j = 0; j <= jx; j++) {
              fw += x[j] * f[jx + (i - j)];
            }
            q[i] = fw;
          }
          jz += k;
          return compute(x, y, jz, q, q0, jk, jv, jx, f);
        }
        jz -= 1;
        q0 -= 24;
        while (IQ[jz] === 0) {
          jz -= 1;
          q0 -= 24;
        }
      } else {
        z = ldexp(z, -q0);
        if (z >= TWO24) {
          fw = TWON24 * z | 0;
          IQ[jz] = z - TWO24 * fw | 0;
          jz += 1;
          q0 += 24;
          IQ[jz] = fw;
        } else {
          IQ[jz] = z | 0;
        }
      }
      fw = ldexp(1, q0);
      for (i = jz; i >= 0; i--) {
        q[i] = fw * IQ[i];
        fw *= TWON24;
      }
      for (i = jz; i >= 0; i--) {
        fw = 0;
        for (k = 0; k <= jp && k <= jz - i; k++) {
          fw += PIO2[k] * q[i + k];
        }
        FQ[jz - i] = fw;
      }
      fw = 0;
      for (i = jz; i >= 0; i--) {
        fw += FQ[i];
      }
      if (ih === 0) {
        y[0] = fw;
      } else {
        y[0] = -fw;
      }
      fw = FQ[0] - fw;
      for (i = 1; i <= jz; i++) {
        fw += FQ[i];
      }
      if (ih === 0) {
        y[1] = fw;
      } else {
        y[1] = -fw;
      }
      return n & 7;
    }
    function kernelRempio2(x, y, e0, nx) {
      var fw;
      var jk;
      var jv;
      var jx;
      var jz;
      var q0;
      var i;
      var j;
      var m;
      jk = 4;
      jx = nx - 1;
      jv = (e0 - 3) / 24 | 0;
      if (jv < 0) {
        jv = 0;
      }
      q0 = e0 - 24 * (jv + 1);
      j = jv - jx;
      m = jx + jk;
      for (i = 0; i <= m; i++) {
        if (j < 0) {
          F[i] = 0;
        } else {
          F[i] = IPIO2[j];
        }
        j += 1;
      }
      for (i = 0; i <= jk; i++) {
        fw = 0;
        for (j = 0; j <= jx; j++) {
          fw += x[j] * F[jx + (i - j)];
        }
        Q[i] = fw;
      }
      jz = jk;
      return compute(x, y, jz, Q, q0, jk, jv, jx, F);
    }
    module.exports = kernelRempio2;
  }
});

// node_modules/@stdlib/math-base-special-round/lib/main.js
var require_main67 = __commonJS({
  "node_modules/@stdlib/math-base-special-round/lib/main.js"(exports, module) {
    "use strict";
    var round = Math.round;
    module.exports = round;
  }
});

// node_modules/@stdlib/math-base-special-round/lib/index.js
var require_lib92 = __commonJS({
  "node_modules/@stdlib/math-base-special-round/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main67();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/rempio2_medium.js
var require_rempio2_medium = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/rempio2_medium.js"(exports, module) {
    "use strict";
    var round = require_lib92();
    var getHighWord = require_lib42();
    var INVPIO2 = 0.6366197723675814;
    var PIO2_1 = 1.5707963267341256;
    var PIO2_1T = 6077100506506192e-26;
    var PIO2_2 = 6077100506303966e-26;
    var PIO2_2T = 20222662487959506e-37;
    var PIO2_3 = 20222662487111665e-37;
    var PIO2_3T = 84784276603689e-45;
    var EXPONENT_MASK = 2047 | 0;
    function rempio2Medium(x, ix, y) {
      var high;
      var n;
      var t;
      var r;
      var w;
      var i;
      var j;
      n = round(x * INVPIO2);
      r = x - n * PIO2_1;
      w = n * PIO2_1T;
      j = ix >> 20 | 0;
      y[0] = r - w;
      high = getHighWord(y[0]);
      i = j - (high >> 20 & EXPONENT_MASK);
      if (i > 16) {
        t = r;
        w = n * PIO2_2;
        r = t - w;
        w = n * PIO2_2T - (t - r - w);
        y[0] = r - w;
        high = getHighWord(y[0]);
        i = j - (high >> 20 & EXPONENT_MASK);
        if (i > 49) {
          t = r;
          w = n * PIO2_3;
          r = t - w;
          w = n * PIO2_3T - (t - r - w);
          y[0] = r - w;
        }
      }
      y[1] = r - y[0] - w;
      return n;
    }
    module.exports = rempio2Medium;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/main.js
var require_main68 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/main.js"(exports, module) {
    "use strict";
    var ABS_MASK = require_lib19();
    var EXPONENT_MASK = require_lib48();
    var SIGNIFICAND_MASK = require_lib74();
    var getHighWord = require_lib42();
    var getLowWord = require_lib89();
    var fromWords = require_lib43();
    var rempio2Kernel = require_kernel_rempio2();
    var rempio2Medium = require_rempio2_medium();
    var ZERO = 0;
    var TWO24 = 16777216;
    var PIO2_1 = 1.5707963267341256;
    var PIO2_1T = 6077100506506192e-26;
    var TWO_PIO2_1T = 2 * PIO2_1T;
    var THREE_PIO2_1T = 3 * PIO2_1T;
    var FOUR_PIO2_1T = 4 * PIO2_1T;
    var PI_HIGH_WORD_SIGNIFICAND = 598523 | 0;
    var PIO4_HIGH_WORD = 1072243195 | 0;
    var THREE_PIO4_HIGH_WORD = 1073928572 | 0;
    var FIVE_PIO4_HIGH_WORD = 1074752122 | 0;
    var THREE_PIO2_HIGH_WORD = 1074977148 | 0;
    var SEVEN_PIO4_HIGH_WORD = 1075183036 | 0;
    var TWO_PI_HIGH_WORD = 1075388923 | 0;
    var NINE_PIO4_HIGH_WORD = 1075594811 | 0;
    var MEDIUM = 1094263291 | 0;
    var TX = [0, 0, 0];
    var TY = [0, 0];
    function rempio2(x, y) {
      var low;
      var e0;
      var hx;
      var ix;
      var nx;
      var i;
      var n;
      var z;
      hx = getHighWord(x) | 0;
      ix = hx & ABS_MASK | 0;
      if (ix <= PIO4_HIGH_WORD) {
        y[0] = x;
        y[1] = 0;
        return 0;
      }
      if (ix <= FIVE_PIO4_HIGH_WORD) {
        if ((ix & SIGNIFICAND_MASK) === PI_HIGH_WORD_SIGNIFICAND) {
          return rempio2Medium(x, ix, y);
        }
        if (ix <= THREE_PIO4_HIGH_WORD) {
          if (hx > 0) {
            z = x - PIO2_1;
            y[0] = z - PIO2_1T;
            y[1] = z - y[0] - PIO2_1T;
            return 1;
          }
          z = x + PIO2_1;
          y[0] = z + PIO2_1T;
          y[1] = z - y[0] + PIO2_1T;
          return -1;
        }
        if (hx > 0) {
          z = x - 2 * PIO2_1;
          y[0] = z - TWO_PIO2_1T;
          y[1] = z - y[0] - TWO_PIO2_1T;
          return 2;
        }
        z = x + 2 * PIO2_1;
        y[0] = z + TWO_PIO2_1T;
        y[1] = z - y[0] + TWO_PIO2_1T;
        return -2;
      }
      if (ix <= NINE_PIO4_HIGH_WORD) {
        if (ix <= SEVEN_PIO4_HIGH_WORD) {
          if (ix === THREE_PIO2_HIGH_WORD) {
            return rempio2Medium(x, ix, y);
          }
          if (hx > 0) {
            z = x - 3 * PIO2_1;
            y[0] = z - THREE_PIO2_1T;
            y[1] = z - y[0] - THREE_PIO2_1T;
            return 3;
          }
          z = x + 3 * PIO2_1;
          y[0] = z + THREE_PIO2_1T;
          y[1] = z - y[0] + THREE_PIO2_1T;
          return -3;
        }
        if (ix === TWO_PI_HIGH_WORD) {
          return rempio2Medium(x, ix, y);
        }
        if (hx > 0) {
          z = x - 4 * PIO2_1;
          y[0] = z - FOUR_PIO2_1T;
          y[1] = z - y[0] - FOUR_PIO2_1T;
          return 4;
        }
        z = x + 4 * PIO2_1;
        y[0] = z + FOUR_PIO2_1T;
        y[1] = z - y[0] + FOUR_PIO2_1T;
        return -4;
      }
      if (ix < MEDIUM) {
        return rempio2Medium(x, ix, y);
      }
      if (ix >= EXPONENT_MASK) {
        y[0] = NaN;
        y[1] = NaN;
        return 0;
      }
      low = getLowWord(x);
      e0 = (ix >> 20) - 1046;
      z = fromWords(ix - (e0 << 20 | 0), low);
      for (i = 0; i < 2; i++) {
        TX[i] = z | 0;
        z = (z - TX[i]) * TWO24;
      }
      TX[2] = z;
      nx = 3;
      while (TX[nx - 1] === ZERO) {
        nx -= 1;
      }
      n = rempio2Kernel(TX, TY, e0, nx, 1);
      if (hx < 0) {
        y[0] = -TY[0];
        y[1] = -TY[1];
        return -n;
      }
      y[0] = TY[0];
      y[1] = TY[1];
      return n;
    }
    module.exports = rempio2;
  }
});

// node_modules/@stdlib/math-base-special-rempio2/lib/index.js
var require_lib93 = __commonJS({
  "node_modules/@stdlib/math-base-special-rempio2/lib/index.js"(exports, module) {
    "use strict";
    var rempio2 = require_main68();
    module.exports = rempio2;
  }
});

// node_modules/@stdlib/math-base-special-sin/lib/main.js
var require_main69 = __commonJS({
  "node_modules/@stdlib/math-base-special-sin/lib/main.js"(exports, module) {
    "use strict";
    var HIGH_WORD_ABS_MASK = require_lib19();
    var HIGH_WORD_EXPONENT_MASK = require_lib48();
    var getHighWord = require_lib42();
    var kernelCos = require_lib87();
    var kernelSin = require_lib88();
    var rempio2 = require_lib93();
    var PIO4_HIGH_WORD = 1072243195 | 0;
    var SMALL_HIGH_WORD = 1045430272 | 0;
    var Y = [0, 0];
    function sin(x) {
      var ix;
      var n;
      ix = getHighWord(x);
      ix &= HIGH_WORD_ABS_MASK;
      if (ix <= PIO4_HIGH_WORD) {
        if (ix < SMALL_HIGH_WORD) {
          return x;
        }
        return kernelSin(x, 0);
      }
      if (ix >= HIGH_WORD_EXPONENT_MASK) {
        return NaN;
      }
      n = rempio2(x, Y);
      switch (n & 3) {
        case 0:
          return kernelSin(Y[0], Y[1]);
        case 1:
          return kernelCos(Y[0], Y[1]);
        case 2:
          return -kernelSin(Y[0], Y[1]);
        default:
          return -kernelCos(Y[0], Y[1]);
      }
    }
    module.exports = sin;
  }
});

// node_modules/@stdlib/math-base-special-sin/lib/index.js
var require_lib94 = __commonJS({
  "node_modules/@stdlib/math-base-special-sin/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main69();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-two-pi/lib/index.js
var require_lib95 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var SQRT_TWO_PI = 2.5066282746310007;
    module.exports = SQRT_TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/polyval_s.js
var require_polyval_s = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/polyval_s.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333334822;
      }
      return 0.08333333333334822 + x * (0.0034722222160545866 + x * (-0.0026813261780578124 + x * (-22954996161337813e-20 + x * 7873113957930937e-19)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/stirling_approximation.js
var require_stirling_approximation = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/stirling_approximation.js"(exports, module) {
    "use strict";
    var SQRT_TWO_PI = require_lib95();
    var pow = require_lib75();
    var exp = require_lib51();
    var polyval = require_polyval_s();
    var MAX_STIRLING = 143.01608;
    function gamma(x) {
      var w;
      var y;
      var v;
      w = 1 / x;
      w = 1 + w * polyval(w);
      y = exp(x);
      if (x > MAX_STIRLING) {
        v = pow(x, 0.5 * x - 0.25);
        y = v * (v / y);
      } else {
        y = pow(x, x - 0.5) / y;
      }
      return SQRT_TWO_PI * y * w;
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/constants-float64-eulergamma/lib/index.js
var require_lib96 = __commonJS({
  "node_modules/@stdlib/constants-float64-eulergamma/lib/index.js"(exports, module) {
    "use strict";
    var EULERGAMMA = 0.5772156649015329;
    module.exports = EULERGAMMA;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/small_approximation.js
var require_small_approximation = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/small_approximation.js"(exports, module) {
    "use strict";
    var EULER = require_lib96();
    function gamma(x, z) {
      return z / ((1 + EULER * x) * x);
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/rational_pq.js
var require_rational_pq2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 1;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 1 + x * (0.4942148268014971 + x * (0.20744822764843598 + x * (0.04763678004571372 + x * (0.010421379756176158 + x * (0.0011913514700658638 + x * (16011952247675185e-20 + x * 0))))));
        s2 = 1 + x * (0.0714304917030273 + x * (-0.23459179571824335 + x * (0.035823639860549865 + x * (0.011813978522206043 + x * (-0.004456419138517973 + x * (5396055804933034e-19 + x * -23158187332412014e-21))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (16011952247675185e-20 + x * (0.0011913514700658638 + x * (0.010421379756176158 + x * (0.04763678004571372 + x * (0.20744822764843598 + x * (0.4942148268014971 + x * 1))))));
        s2 = -23158187332412014e-21 + x * (5396055804933034e-19 + x * (-0.004456419138517973 + x * (0.011813978522206043 + x * (0.035823639860549865 + x * (-0.23459179571824335 + x * (0.0714304917030273 + x * 1))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/main.js
var require_main70 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var isNegativeZero = require_lib81();
    var abs = require_lib46();
    var floor = require_lib7();
    var sin = require_lib94();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var PI = require_lib86();
    var stirlingApprox = require_stirling_approximation();
    var smallApprox = require_small_approximation();
    var rateval = require_rational_pq2();
    function gamma(x) {
      var sign;
      var q;
      var p;
      var z;
      if (isInteger(x) && x < 0 || x === NINF || isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        if (isNegativeZero(x)) {
          return NINF;
        }
        return PINF;
      }
      if (x > 171.61447887182297) {
        return PINF;
      }
      if (x < -170.5674972726612) {
        return 0;
      }
      q = abs(x);
      if (q > 33) {
        if (x >= 0) {
          return stirlingApprox(x);
        }
        p = floor(q);
        if ((p & 1) === 0) {
          sign = -1;
        } else {
          sign = 1;
        }
        z = q - p;
        if (z > 0.5) {
          p += 1;
          z = q - p;
        }
        z = q * sin(PI * z);
        return sign * PI / (abs(z) * stirlingApprox(q));
      }
      z = 1;
      while (x >= 3) {
        x -= 1;
        z *= x;
      }
      while (x < 0) {
        if (x > -1e-9) {
          return smallApprox(x, z);
        }
        z /= x;
        x += 1;
      }
      while (x < 2) {
        if (x < 1e-9) {
          return smallApprox(x, z);
        }
        z /= x;
        x += 1;
      }
      if (x === 2) {
        return z;
      }
      x -= 2;
      return z * rateval(x);
    }
    module.exports = gamma;
  }
});

// node_modules/@stdlib/math-base-special-gamma/lib/index.js
var require_lib97 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main70();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-max-nth-factorial/lib/index.js
var require_lib98 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-nth-factorial/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_NTH_FACTORIAL = 170 | 0;
    module.exports = FLOAT64_MAX_NTH_FACTORIAL;
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/factorials.json
var require_factorials = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/factorials.json"(exports, module) {
    module.exports = [
      1,
      1,
      2,
      6,
      24,
      120,
      720,
      5040,
      40320,
      362880,
      3628800,
      39916800,
      479001600,
      6227020800,
      87178291200,
      1307674368e3,
      20922789888e3,
      355687428096e3,
      6402373705728e3,
      121645100408832e3,
      243290200817664e4,
      5109094217170944e4,
      11240007277776077e5,
      2585201673888498e7,
      6204484017332394e8,
      15511210043330986e9,
      40329146112660565e10,
      10888869450418352e12,
      30488834461171387e13,
      8841761993739702e15,
      26525285981219107e16,
      8222838654177922e18,
      2631308369336935e20,
      8683317618811886e21,
      29523279903960416e22,
      10333147966386145e24,
      37199332678990125e25,
      13763753091226346e27,
      5230226174666011e29,
      20397882081197444e30,
      8159152832478977e32,
      3345252661316381e34,
      140500611775288e37,
      6041526306337383e37,
      2658271574788449e39,
      11962222086548019e40,
      5502622159812089e42,
      25862324151116818e43,
      12413915592536073e45,
      6082818640342675e47,
      30414093201713376e48,
      15511187532873822e50,
      8065817517094388e52,
      42748832840600255e53,
      2308436973392414e56,
      12696403353658276e57,
      7109985878048635e59,
      40526919504877214e60,
      23505613312828785e62,
      13868311854568984e64,
      832098711274139e67,
      5075802138772248e68,
      3146997326038794e70,
      198260831540444e73,
      12688693218588417e73,
      8247650592082472e75,
      5443449390774431e77,
      3647111091818868e79,
      24800355424368305e80,
      1711224524281413e83,
      11978571669969892e84,
      8504785885678623e86,
      61234458376886085e87,
      44701154615126844e89,
      3307885441519386e92,
      248091408113954e95,
      18854947016660504e95,
      14518309202828587e97,
      11324281178206297e99,
      8946182130782976e101,
      7156945704626381e103,
      5797126020747368e105,
      4753643337012842e107,
      3945523969720659e109,
      3314240134565353e111,
      281710411438055e114,
      24227095383672734e114,
      2107757298379528e117,
      18548264225739844e118,
      1650795516090846e121,
      14857159644817615e122,
      1352001527678403e125,
      12438414054641308e126,
      11567725070816416e128,
      1087366156656743e131,
      1032997848823906e133,
      9916779348709496e134,
      9619275968248212e136,
      9426890448883248e138,
      9332621544394415e140,
      9332621544394415e142,
      942594775983836e145,
      9614466715035127e146,
      990290071648618e149,
      10299016745145628e150,
      1081396758240291e153,
      11462805637347084e154,
      1226520203196138e157,
      1324641819451829e159,
      14438595832024937e160,
      1588245541522743e163,
      17629525510902446e164,
      1974506857221074e167,
      22311927486598138e168,
      25435597334721877e170,
      2925093693493016e173,
      3393108684451898e175,
      3969937160808721e177,
      4684525849754291e179,
      5574585761207606e181,
      6689502913449127e183,
      8094298525273444e185,
      9875044200833601e187,
      1214630436702533e190,
      1506141741511141e192,
      1882677176888926e194,
      2372173242880047e196,
      30126600184576594e197,
      3856204823625804e200,
      4974504222477287e202,
      6466855489220474e204,
      847158069087882e207,
      11182486511960043e208,
      14872707060906857e210,
      19929427461615188e212,
      26904727073180504e214,
      3659042881952549e217,
      5012888748274992e219,
      6917786472619489e221,
      9615723196941089e223,
      13462012475717526e225,
      1898143759076171e228,
      2695364137888163e230,
      3854370717180073e232,
      55502938327393044e233,
      8047926057471992e236,
      11749972043909107e238,
      1727245890454639e241,
      25563239178728654e242,
      380892263763057e246,
      5713383956445855e247,
      862720977423324e250,
      13113358856834524e251,
      20063439050956823e253,
      30897696138473508e255,
      4789142901463394e258,
      7471062926282894e260,
      11729568794264145e262,
      1853271869493735e265,
      29467022724950384e266,
      47147236359920616e268,
      7590705053947219e271,
      12296942187394494e273,
      20044015765453026e275,
      3287218585534296e278,
      5423910666131589e280,
      9003691705778438e282,
      1503616514864999e285,
      25260757449731984e286,
      4269068009004705e289,
      7257415615307999e291
    ];
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/main.js
var require_main71 = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var gamma = require_lib97();
    var PINF = require_lib12();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var FACTORIALS = require_factorials();
    function factorial(x) {
      if (isnan(x)) {
        return NaN;
      }
      if (isInteger(x)) {
        if (x < 0) {
          return NaN;
        }
        if (x <= FLOAT64_MAX_NTH_FACTORIAL) {
          return FACTORIALS[x];
        }
        return PINF;
      }
      return gamma(x + 1);
    }
    module.exports = factorial;
  }
});

// node_modules/@stdlib/math-base-special-factorial/lib/index.js
var require_lib99 = __commonJS({
  "node_modules/@stdlib/math-base-special-factorial/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main71();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/rational_pq.js
var require_rational_pq3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 3847467039331777e-5 + x * (3685766504351951e-5 + x * (1588920245372942e-5 + x * (4059208354298835e-6 + x * (6805476611834733e-7 + x * (7823975500312005e-8 + x * (6246580776401795e-9 + x * (341986.3488721347 + x * (12287.194511824551 + x * (261.61404416416684 + x * 2.5066282746310007)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 2.5066282746310007 + x * (261.61404416416684 + x * (12287.194511824551 + x * (341986.3488721347 + x * (6246580776401795e-9 + x * (7823975500312005e-8 + x * (6805476611834733e-7 + x * (4059208354298835e-6 + x * (1588920245372942e-5 + x * (3685766504351951e-5 + x * 3847467039331777e-5)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/main.js
var require_main72 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/main.js"(exports, module) {
    "use strict";
    var gammaLanczosSum = require_rational_pq3();
    module.exports = gammaLanczosSum;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/index.js
var require_lib100 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main72();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-gamma-lanczos-g/lib/index.js
var require_lib101 = __commonJS({
  "node_modules/@stdlib/constants-float64-gamma-lanczos-g/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_GAMMA_LANCZOS_G = 10.900511;
    module.exports = FLOAT64_GAMMA_LANCZOS_G;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/gamma_delta_ratio_lanczos.js
var require_gamma_delta_ratio_lanczos = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/gamma_delta_ratio_lanczos.js"(exports, module) {
    "use strict";
    var lanczosSum = require_lib100();
    var gamma = require_lib97();
    var log1p = require_lib65();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var EPSILON = require_lib77();
    var E = require_lib76();
    var G = require_lib101();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var FACTORIAL_169 = 4269068009004705e289;
    function gammaDeltaRatioLanczos(z, delta) {
      var result;
      var ratio;
      var zgh;
      if (z < EPSILON) {
        if (delta >= FLOAT64_MAX_NTH_FACTORIAL) {
          ratio = gammaDeltaRatioLanczos(delta, FLOAT64_MAX_NTH_FACTORIAL - delta);
          ratio *= z;
          ratio *= FACTORIAL_169;
          return 1 / ratio;
        }
        return 1 / (z * gamma(z + delta));
      }
      zgh = z + G - 0.5;
      if (z + delta === z) {
        if (abs(delta / zgh) < EPSILON) {
          result = exp(-delta);
        } else {
          result = 1;
        }
      } else {
        if (abs(delta) < 10) {
          result = exp((0.5 - z) * log1p(delta / zgh));
        } else {
          result = pow(zgh / (zgh + delta), z - 0.5);
        }
        result *= lanczosSum(z) / lanczosSum(z + delta);
      }
      result *= pow(E / (zgh + delta), delta);
      return result;
    }
    module.exports = gammaDeltaRatioLanczos;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/main.js
var require_main73 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var floor = require_lib7();
    var gamma = require_lib97();
    var factorial = require_lib99();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var gammaDeltaRatioLanczos = require_gamma_delta_ratio_lanczos();
    function gammaDeltaRatio(z, delta) {
      var result;
      var idelta;
      var iz;
      if (z <= 0 || z + delta <= 0) {
        return gamma(z) / gamma(z + delta);
      }
      idelta = floor(delta);
      if (idelta === delta) {
        iz = floor(z);
        if (iz === z) {
          if (z <= FLOAT64_MAX_NTH_FACTORIAL && z + delta <= FLOAT64_MAX_NTH_FACTORIAL) {
            return factorial(iz - 1) / factorial(idelta + iz - 1);
          }
        }
        if (abs(delta) < 20) {
          if (delta === 0) {
            return 1;
          }
          if (delta < 0) {
            z -= 1;
            result = z;
            delta += 1;
            while (delta !== 0) {
              z -= 1;
              result *= z;
              delta += 1;
            }
            return result;
          }
          result = 1 / z;
          delta -= 1;
          while (delta !== 0) {
            z += 1;
            result /= z;
            delta -= 1;
          }
          return result;
        }
      }
      return gammaDeltaRatioLanczos(z, delta);
    }
    module.exports = gammaDeltaRatio;
  }
});

// node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/index.js
var require_lib102 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-delta-ratio/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main73();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-cos/lib/main.js
var require_main74 = __commonJS({
  "node_modules/@stdlib/math-base-special-cos/lib/main.js"(exports, module) {
    "use strict";
    var getHighWord = require_lib42();
    var kernelCos = require_lib87();
    var kernelSin = require_lib88();
    var rempio2 = require_lib93();
    var ABS_MASK = require_lib19();
    var EXPONENT_MASK = require_lib48();
    var buffer = [0, 0];
    var HIGH_WORD_PIO4 = 1072243195 | 0;
    var HIGH_WORD_TWO_NEG_27 = 1044381696 | 0;
    function cos(x) {
      var ix;
      var n;
      ix = getHighWord(x);
      ix &= ABS_MASK;
      if (ix <= HIGH_WORD_PIO4) {
        if (ix < HIGH_WORD_TWO_NEG_27) {
          return 1;
        }
        return kernelCos(x, 0);
      }
      if (ix >= EXPONENT_MASK) {
        return NaN;
      }
      n = rempio2(x, buffer);
      switch (n & 3) {
        case 0:
          return kernelCos(buffer[0], buffer[1]);
        case 1:
          return -kernelSin(buffer[0], buffer[1]);
        case 2:
          return -kernelCos(buffer[0], buffer[1]);
        default:
          return kernelSin(buffer[0], buffer[1]);
      }
    }
    module.exports = cos;
  }
});

// node_modules/@stdlib/math-base-special-cos/lib/index.js
var require_lib103 = __commonJS({
  "node_modules/@stdlib/math-base-special-cos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main74();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-sinpi/lib/main.js
var require_main75 = __commonJS({
  "node_modules/@stdlib/math-base-special-sinpi/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var cos = require_lib103();
    var sin = require_lib94();
    var abs = require_lib46();
    var copysign = require_lib44();
    var PI = require_lib86();
    function sinpi(x) {
      var ar;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (isInfinite(x)) {
        return NaN;
      }
      r = x % 2;
      ar = abs(r);
      if (ar === 0 || ar === 1) {
        return copysign(0, r);
      }
      if (ar < 0.25) {
        return sin(PI * r);
      }
      if (ar < 0.75) {
        ar = 0.5 - ar;
        return copysign(cos(PI * ar), r);
      }
      if (ar < 1.25) {
        r = copysign(1, r) - r;
        return sin(PI * r);
      }
      if (ar < 1.75) {
        ar -= 1.5;
        return -copysign(cos(PI * ar), r);
      }
      r -= copysign(2, r);
      return sin(PI * r);
    }
    module.exports = sinpi;
  }
});

// node_modules/@stdlib/math-base-special-sinpi/lib/index.js
var require_lib104 = __commonJS({
  "node_modules/@stdlib/math-base-special-sinpi/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main75();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a1.js
var require_polyval_a1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.06735230105312927;
      }
      return 0.06735230105312927 + x * (0.007385550860814029 + x * (0.0011927076318336207 + x * (22086279071390839e-20 + x * 25214456545125733e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a2.js
var require_polyval_a2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_a2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.020580808432516733;
      }
      return 0.020580808432516733 + x * (0.0028905138367341563 + x * (5100697921535113e-19 + x * (10801156724758394e-20 + x * 44864094961891516e-21)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_r.js
var require_polyval_r = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_r.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1.3920053346762105;
      }
      return 1.3920053346762105 + x * (0.7219355475671381 + x * (0.17193386563280308 + x * (0.01864591917156529 + x * (7779424963818936e-19 + x * 7326684307446256e-21))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_s.js
var require_polyval_s2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_s.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.21498241596060885;
      }
      return 0.21498241596060885 + x * (0.325778796408931 + x * (0.14635047265246445 + x * (0.02664227030336386 + x * (0.0018402845140733772 + x * 3194753265841009e-20))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t1.js
var require_polyval_t1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.032788541075985965;
      }
      return -0.032788541075985965 + x * (0.006100538702462913 + x * (-0.0014034646998923284 + x * 31563207090362595e-20));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t2.js
var require_polyval_t2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.01797067508118204;
      }
      return 0.01797067508118204 + x * (-0.0036845201678113826 + x * (881081882437654e-18 + x * -31275416837512086e-20));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t3.js
var require_polyval_t3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_t3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.010314224129834144;
      }
      return -0.010314224129834144 + x * (0.0022596478090061247 + x * (-5385953053567405e-19 + x * 3355291926355191e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_u.js
var require_polyval_u = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_u.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.6328270640250934;
      }
      return 0.6328270640250934 + x * (1.4549225013723477 + x * (0.9777175279633727 + x * (0.22896372806469245 + x * 0.013381091853678766)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_v.js
var require_polyval_v = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_v.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 2.4559779371304113;
      }
      return 2.4559779371304113 + x * (2.128489763798934 + x * (0.7692851504566728 + x * (0.10422264559336913 + x * 0.003217092422824239)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/polyval_w.js
var require_polyval_w2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/polyval_w.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333333297;
      }
      return 0.08333333333333297 + x * (-0.0027777777772877554 + x * (7936505586430196e-19 + x * (-59518755745034e-17 + x * (8363399189962821e-19 + x * -0.0016309293409657527))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/main.js
var require_main76 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInfinite = require_lib17();
    var abs = require_lib46();
    var ln = require_lib59();
    var trunc = require_lib9();
    var sinpi = require_lib104();
    var PI = require_lib86();
    var PINF = require_lib12();
    var polyvalA1 = require_polyval_a1();
    var polyvalA2 = require_polyval_a2();
    var polyvalR = require_polyval_r();
    var polyvalS = require_polyval_s2();
    var polyvalT1 = require_polyval_t1();
    var polyvalT2 = require_polyval_t2();
    var polyvalT3 = require_polyval_t3();
    var polyvalU = require_polyval_u();
    var polyvalV = require_polyval_v();
    var polyvalW = require_polyval_w2();
    var A1C = 0.07721566490153287;
    var A2C = 0.3224670334241136;
    var RC = 1;
    var SC = -0.07721566490153287;
    var T1C = 0.48383612272381005;
    var T2C = -0.1475877229945939;
    var T3C = 0.06462494023913339;
    var UC = -0.07721566490153287;
    var VC = 1;
    var WC = 0.4189385332046727;
    var YMIN = 1.4616321449683622;
    var TWO52 = 4503599627370496;
    var TWO56 = 72057594037927940;
    var TINY = 13877787807814457e-33;
    var TC = 1.4616321449683622;
    var TF = -0.12148629053584961;
    var TT = -3638676997039505e-33;
    function gammaln(x) {
      var isNegative;
      var nadj;
      var flg;
      var p3;
      var p2;
      var p1;
      var p;
      var q;
      var t;
      var w;
      var y;
      var z;
      var r;
      if (isnan(x) || isInfinite(x)) {
        return x;
      }
      if (x === 0) {
        return PINF;
      }
      if (x < 0) {
        isNegative = true;
        x = -x;
      } else {
        isNegative = false;
      }
      if (x < TINY) {
        return -ln(x);
      }
      if (isNegative) {
        if (x >= TWO52) {
          return PINF;
        }
        t = sinpi(x);
        if (t === 0) {
          return PINF;
        }
        nadj = ln(PI / abs(t * x));
      }
      if (x === 1 || x === 2) {
        return 0;
      }
      if (x < 2) {
        if (x <= 0.9) {
          r = -ln(x);
          if (x >= YMIN - 1 + 0.27) {
            y = 1 - x;
            flg = 0;
          } else if (x >= YMIN - 1 - 0.27) {
            y = x - (TC - 1);
            flg = 1;
          } else {
            y = x;
            flg = 2;
          }
        } else {
          r = 0;
          if (x >= YMIN + 0.27) {
            y = 2 - x;
            flg = 0;
          } else if (x >= YMIN - 0.27) {
            y = x - TC;
            flg = 1;
          } else {
            y = x - 1;
            flg = 2;
          }
        }
        switch (flg) {
          // eslint-disable-line default-case
          case 0:
            z = y * y;
            p1 = A1C + z * polyvalA1(z);
            p2 = z * (A2C + z * polyvalA2(z));
            p = y * p1 + p2;
            r += p - 0.5 * y;
            break;
          case 1:
            z = y * y;
            w = z * y;
            p1 = T1C + w * polyvalT1(w);
            p2 = T2C + w * polyvalT2(w);
            p3 = T3C + w * polyvalT3(w);
            p = z * p1 - (TT - w * (p2 + y * p3));
            r += TF + p;
            break;
          case 2:
            p1 = y * (UC + y * polyvalU(y));
            p2 = VC + y * polyvalV(y);
            r += -0.5 * y + p1 / p2;
            break;
        }
      } else if (x < 8) {
        flg = trunc(x);
        y = x - flg;
        p = y * (SC + y * polyvalS(y));
        q = RC + y * polyvalR(y);
        r = 0.5 * y + p / q;
        z = 1;
        switch (flg) {
          // eslint-disable-line default-case
          case 7:
            z *= y + 6;
          /* Falls through */
          case 6:
            z *= y + 5;
          /* Falls through */
          case 5:
            z *= y + 4;
          /* Falls through */
          case 4:
            z *= y + 3;
          /* Falls through */
          case 3:
            z *= y + 2;
            r += ln(z);
        }
      } else if (x < TWO56) {
        t = ln(x);
        z = 1 / x;
        y = z * z;
        w = WC + z * polyvalW(y);
        r = (x - 0.5) * (t - 1) + w;
      } else {
        r = x * (ln(x) - 1);
      }
      if (isNegative) {
        r = nadj - r;
      }
      return r;
    }
    module.exports = gammaln;
  }
});

// node_modules/@stdlib/math-base-special-gammaln/lib/index.js
var require_lib105 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaln/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main76();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-max-ln/lib/index.js
var require_lib106 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-ln/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_LN = 709.782712893384;
    module.exports = FLOAT64_MAX_LN;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-eps/lib/index.js
var require_lib107 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-eps/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SQRT_EPSILON = 14901161193847656e-24;
    module.exports = FLOAT64_SQRT_EPSILON;
  }
});

// node_modules/@stdlib/utils-eval/lib/index.js
var require_lib108 = __commonJS({
  "node_modules/@stdlib/utils-eval/lib/index.js"(exports, module) {
    "use strict";
    var evil = eval;
    module.exports = evil;
  }
});

// node_modules/@stdlib/assert-has-generator-support/lib/main.js
var require_main77 = __commonJS({
  "node_modules/@stdlib/assert-has-generator-support/lib/main.js"(exports, module) {
    "use strict";
    var evil = require_lib108();
    function hasGeneratorSupport() {
      var bool;
      try {
        evil('"use strict"; (function* () {})');
        bool = true;
      } catch (err) {
        bool = false;
      }
      return bool;
    }
    module.exports = hasGeneratorSupport;
  }
});

// node_modules/@stdlib/assert-has-generator-support/lib/index.js
var require_lib109 = __commonJS({
  "node_modules/@stdlib/assert-has-generator-support/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main77();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/generators.js
var require_generators = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/generators.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var MAX_TERMS = 1e6;
    function sumSeries(generator, options) {
      var isgenerator;
      var tolerance;
      var nextTerm;
      var counter;
      var result;
      var opts;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      tolerance = opts.tolerance || EPS;
      counter = opts.maxTerms || MAX_TERMS;
      result = opts.initialValue || 0;
      isgenerator = typeof generator.next === "function";
      if (isgenerator === true) {
        for (nextTerm of generator) {
          result += nextTerm;
          if (abs(tolerance * result) >= abs(nextTerm) || --counter === 0) {
            break;
          }
        }
      } else {
        do {
          nextTerm = generator();
          result += nextTerm;
        } while (abs(tolerance * result) < abs(nextTerm) && --counter);
      }
      return result;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/basic.js
var require_basic = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/basic.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var MAX_TERMS = 1e6;
    function sumSeries(generator, options) {
      var tolerance;
      var nextTerm;
      var counter;
      var result;
      var opts;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      tolerance = opts.tolerance || EPS;
      counter = opts.maxTerms || MAX_TERMS;
      result = opts.initialValue || 0;
      do {
        nextTerm = generator();
        result += nextTerm;
      } while (abs(tolerance * result) < abs(nextTerm) && --counter);
      return result;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-tools-sum-series/lib/index.js
var require_lib110 = __commonJS({
  "node_modules/@stdlib/math-base-tools-sum-series/lib/index.js"(exports, module) {
    "use strict";
    var hasGeneratorSupport = require_lib109();
    var generator = require_generators();
    var basic = require_basic();
    var sumSeries;
    if (hasGeneratorSupport()) {
      sumSeries = generator;
    } else {
      sumSeries = basic;
    }
    module.exports = sumSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x_series.js
var require_tgamma_i_large_x_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x_series.js"(exports, module) {
    "use strict";
    function tgammaILargeXSeries(a1, x1) {
      var result = 1;
      var a = a1;
      var x = x1;
      return next;
      function next() {
        var r = result;
        result *= a / x;
        a -= 1;
        return r;
      }
    }
    module.exports = tgammaILargeXSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x.js
var require_tgamma_i_large_x = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_i_large_x.js"(exports, module) {
    "use strict";
    var sumSeries = require_lib110();
    var tgammaILargeXSeries = require_tgamma_i_large_x_series();
    function tgammaILargeX(a, x) {
      var result;
      var s;
      s = tgammaILargeXSeries(a, x);
      result = sumSeries(s);
      return result;
    }
    module.exports = tgammaILargeX;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/finite_gamma_q.js
var require_finite_gamma_q = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/finite_gamma_q.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    function finiteGammaQ(a, x) {
      var term;
      var sum;
      var e;
      var n;
      e = exp(-x);
      sum = e;
      if (sum !== 0) {
        term = sum;
        for (n = 1; n < a; ++n) {
          term /= n;
          term *= x;
          sum += term;
        }
      }
      return sum;
    }
    module.exports = finiteGammaQ;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/finite_half_gamma_q.js
var require_finite_half_gamma_q = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/finite_half_gamma_q.js"(exports, module) {
    "use strict";
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var PI = require_lib86();
    function finiteHalfGammaQ(a, x) {
      var half;
      var term;
      var sum;
      var e;
      var n;
      e = erfc(sqrt(x));
      if (e !== 0 && a > 1) {
        term = exp(-x) / sqrt(PI * x);
        term *= x;
        half = 0.5;
        term /= half;
        sum = term;
        for (n = 2; n < a; ++n) {
          term /= n - half;
          term *= x;
          sum += term;
        }
        e += sum;
      }
      return e;
    }
    module.exports = finiteHalfGammaQ;
  }
});

// node_modules/@stdlib/constants-float64-min-ln/lib/index.js
var require_lib111 = __commonJS({
  "node_modules/@stdlib/constants-float64-min-ln/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MIN_LN = -708.3964185322641;
    module.exports = FLOAT64_MIN_LN;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/full_igamma_prefix.js
var require_full_igamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/full_igamma_prefix.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    function fullIGammaPrefix(a, z) {
      var prefix;
      var alz;
      alz = a * ln(z);
      if (z >= 1) {
        if (alz < MAX_LN && -z > MIN_LN) {
          prefix = pow(z, a) * exp(-z);
        } else if (a >= 1) {
          prefix = pow(z / exp(z / a), a);
        } else {
          prefix = exp(alz - z);
        }
      } else {
        if (alz > MIN_LN) {
          prefix = pow(z, a) * exp(-z);
        } else if (z / a < MAX_LN) {
          prefix = pow(z / exp(z / a), a);
        } else {
          prefix = exp(alz - z);
        }
      }
      return prefix;
    }
    module.exports = fullIGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/main.js
var require_main78 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/main.js"(exports, module) {
    "use strict";
    function evalpoly(c, x) {
      var p;
      var i;
      i = c.length;
      if (i < 2 || x === 0) {
        if (i === 0) {
          return 0;
        }
        return c[0];
      }
      i -= 1;
      p = c[i] * x + c[i - 1];
      i -= 2;
      while (i >= 0) {
        p = p * x + c[i];
        i -= 1;
      }
      return p;
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/function-ctor/lib/main.js
var require_main79 = __commonJS({
  "node_modules/@stdlib/function-ctor/lib/main.js"(exports, module) {
    "use strict";
    var Fcn = Function;
    module.exports = Fcn;
  }
});

// node_modules/@stdlib/function-ctor/lib/index.js
var require_lib112 = __commonJS({
  "node_modules/@stdlib/function-ctor/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main79();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/factory.js
var require_factory5 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/factory.js"(exports, module) {
    "use strict";
    var Fcn = require_lib112();
    var evalpoly = require_main78();
    function factory(c) {
      var f;
      var n;
      var m;
      var i;
      if (c.length > 500) {
        return polyval;
      }
      f = "return function evalpoly(x){";
      n = c.length;
      if (n === 0) {
        f += "return 0.0;";
      } else if (n === 1) {
        f += "return " + c[0] + ";";
      } else {
        f += "if(x===0.0){return " + c[0] + ";}";
        f += "return " + c[0];
        m = n - 1;
        for (i = 1; i < n; i++) {
          f += "+x*";
          if (i < m) {
            f += "(";
          }
          f += c[i];
        }
        for (i = 0; i < m - 1; i++) {
          f += ")";
        }
        f += ";";
      }
      f += "}";
      f += "//# sourceURL=evalpoly.factory.js";
      return new Fcn(f)();
      function polyval(x) {
        return evalpoly(c, x);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/math-base-tools-evalpoly/lib/index.js
var require_lib113 = __commonJS({
  "node_modules/@stdlib/math-base-tools-evalpoly/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main78();
    var factory = require_factory5();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/log1p_series.js
var require_log1p_series = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/log1p_series.js"(exports, module) {
    "use strict";
    function log1pSeries(x) {
      var mMult = -x;
      var mProd = -1;
      var k = 0;
      return next;
      function next() {
        mProd *= mMult;
        k += 1;
        return mProd / k;
      }
    }
    module.exports = log1pSeries;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/main.js
var require_main80 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ln = require_lib59();
    var FLOAT_EPS = require_lib77();
    var sumSeries = require_lib110();
    var log1pSeries = require_log1p_series();
    function log1pmx(x) {
      var opts;
      var ax;
      if (x <= -1) {
        return NaN;
      }
      ax = abs(x);
      if (ax > 0.95) {
        return ln(1 + x) - x;
      }
      if (ax < FLOAT_EPS) {
        return -x * x / 2;
      }
      opts = {
        "initialValue": -x
      };
      return sumSeries(log1pSeries(x), opts);
    }
    module.exports = log1pmx;
  }
});

// node_modules/@stdlib/math-base-special-log1pmx/lib/index.js
var require_lib114 = __commonJS({
  "node_modules/@stdlib/math-base-special-log1pmx/lib/index.js"(exports, module) {
    "use strict";
    var log1pmx = require_main80();
    module.exports = log1pmx;
  }
});

// node_modules/@stdlib/constants-float64-two-pi/lib/index.js
var require_lib115 = __commonJS({
  "node_modules/@stdlib/constants-float64-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var TWO_PI = 6.283185307179586;
    module.exports = TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c0.js
var require_polyval_c0 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c0.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.3333333333333333;
      }
      return -0.3333333333333333 + x * (0.08333333333333333 + x * (-0.014814814814814815 + x * (0.0011574074074074073 + x * (3527336860670194e-19 + x * (-1787551440329218e-19 + x * (3919263178522438e-20 + x * (-21854485106799924e-22 + x * (-185406221071516e-20 + x * (8296711340953087e-22 + x * (-17665952736826078e-23 + x * (6707853543401498e-24 + x * (10261809784240309e-24 + x * (-4382036018453353e-24 + x * 914769958223679e-24)))))))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c1.js
var require_polyval_c1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -0.001851851851851852;
      }
      return -0.001851851851851852 + x * (-0.003472222222222222 + x * (0.0026455026455026454 + x * (-9902263374485596e-19 + x * (20576131687242798e-20 + x * (-4018775720164609e-22 + x * (-18098550334489977e-21 + x * (764916091608111e-20 + x * (-16120900894563446e-22 + x * (4647127802807434e-24 + x * (1378633446915721e-22 + x * (-5752545603517705e-23 + x * 11951628599778148e-24)))))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c2.js
var require_polyval_c2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.004133597883597883;
      }
      return 0.004133597883597883 + x * (-0.0026813271604938273 + x * (7716049382716049e-19 + x * (20093878600823047e-22 + x * (-10736653226365161e-20 + x * (52923448829120125e-21 + x * (-12760635188618728e-21 + x * (3423578734096138e-23 + x * (13721957309062932e-22 + x * (-6298992138380055e-22 + x * 14280614206064242e-23)))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c3.js
var require_polyval_c3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 6494341563786008e-19;
      }
      return 6494341563786008e-19 + x * (22947209362139917e-20 + x * (-4691894943952557e-19 + x * (26772063206283885e-20 + x * (-7561801671883977e-20 + x * (-2396505113867297e-22 + x * (11082654115347302e-21 + x * (-56749528269915965e-22 + x * 14230900732435883e-22)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c4.js
var require_polyval_c4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c4.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -8618882909167117e-19;
      }
      return -8618882909167117e-19 + x * (7840392217200666e-19 + x * (-2990724803031902e-19 + x * (-14638452578843418e-22 + x * (6641498215465122e-20 + x * (-3968365047179435e-20 + x * 11375726970678419e-21)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c5.js
var require_polyval_c5 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c5.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -33679855336635813e-20;
      }
      return -33679855336635813e-20 + x * (-6972813758365858e-20 + x * (2772753244959392e-19 + x * (-19932570516188847e-20 + x * (6797780477937208e-20 + x * (1419062920643967e-22 + x * (-13594048189768693e-21 + x * (8018470256334202e-21 + x * -2291481176508095e-21)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c6.js
var require_polyval_c6 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c6.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 5313079364639922e-19;
      }
      return 5313079364639922e-19 + x * (-5921664373536939e-19 + x * (2708782096718045e-19 + x * (7902353232660328e-22 + x * (-8153969367561969e-20 + x * (561168275310625e-19 + x * -18329116582843375e-21)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c7.js
var require_polyval_c7 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c7.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 34436760689237765e-20;
      }
      return 34436760689237765e-20 + x * (5171790908260592e-20 + x * (-33493161081142234e-20 + x * (2812695154763237e-19 + x * -10976582244684731e-20)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c8.js
var require_polyval_c8 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/polyval_c8.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -6526239185953094e-19;
      }
      return -6526239185953094e-19 + x * (8394987206720873e-19 + x * -438297098541721e-18);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/igamma_temme_large.js
var require_igamma_temme_large = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/igamma_temme_large.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var log1pmx = require_lib114();
    var erfc = require_lib53();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var TWO_PI = require_lib115();
    var polyvalC0 = require_polyval_c0();
    var polyvalC1 = require_polyval_c1();
    var polyvalC2 = require_polyval_c2();
    var polyvalC3 = require_polyval_c3();
    var polyvalC4 = require_polyval_c4();
    var polyvalC5 = require_polyval_c5();
    var polyvalC6 = require_polyval_c6();
    var polyvalC7 = require_polyval_c7();
    var polyvalC8 = require_polyval_c8();
    var workspace = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    function igammaTemmeLarge(a, x) {
      var result;
      var sigma;
      var phi;
      var y;
      var z;
      sigma = (x - a) / a;
      phi = -log1pmx(sigma);
      y = a * phi;
      z = sqrt(2 * phi);
      if (x < a) {
        z = -z;
      }
      workspace[0] = polyvalC0(z);
      workspace[1] = polyvalC1(z);
      workspace[2] = polyvalC2(z);
      workspace[3] = polyvalC3(z);
      workspace[4] = polyvalC4(z);
      workspace[5] = polyvalC5(z);
      workspace[6] = polyvalC6(z);
      workspace[7] = polyvalC7(z);
      workspace[8] = polyvalC8(z);
      workspace[9] = -5967612901927463e-19;
      result = evalpoly(workspace, 1 / a);
      result *= exp(-y) / sqrt(TWO_PI * a);
      if (x < a) {
        result = -result;
      }
      result += erfc(sqrt(y)) / 2;
      return result;
    }
    module.exports = igammaTemmeLarge;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/lower_incomplete_gamma_series.js
var require_lower_incomplete_gamma_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/lower_incomplete_gamma_series.js"(exports, module) {
    "use strict";
    function lowerIncompleteGammaSeries(a1, z1) {
      var result = 1;
      var a = a1;
      var z = z1;
      return next;
      function next() {
        var r = result;
        a += 1;
        result *= z / a;
        return r;
      }
    }
    module.exports = lowerIncompleteGammaSeries;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/lower_gamma_series.js
var require_lower_gamma_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/lower_gamma_series.js"(exports, module) {
    "use strict";
    var sumSeries = require_lib110();
    var lowerIncompleteGammaSeries = require_lower_incomplete_gamma_series();
    function lowerGammaSeries(a, z, initialValue) {
      var result;
      var s;
      initialValue = initialValue || 0;
      s = lowerIncompleteGammaSeries(a, z);
      result = sumSeries(s, {
        "initialValue": initialValue
      });
      return result;
    }
    module.exports = lowerGammaSeries;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/rational_pq.js
var require_rational_pq4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/rational_pq.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return Infinity;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 709811.662581658 + x * (679979.8474157227 + x * (293136.7857211597 + x * (74887.54032914672 + x * (12555.290582413863 + x * (1443.4299244417066 + x * (115.24194596137347 + x * (6.309239205732627 + x * (0.22668404630224365 + x * (0.004826466289237662 + x * 4624429436045379e-20)))))))));
        s2 = 0 + x * (362880 + x * (1026576 + x * (1172700 + x * (723680 + x * (269325 + x * (63273 + x * (9450 + x * (870 + x * (45 + x * 1)))))))));
      } else {
        x = 1 / x;
        s1 = 4624429436045379e-20 + x * (0.004826466289237662 + x * (0.22668404630224365 + x * (6.309239205732627 + x * (115.24194596137347 + x * (1443.4299244417066 + x * (12555.290582413863 + x * (74887.54032914672 + x * (293136.7857211597 + x * (679979.8474157227 + x * 709811.662581658)))))))));
        s2 = 1 + x * (45 + x * (870 + x * (9450 + x * (63273 + x * (269325 + x * (723680 + x * (1172700 + x * (1026576 + x * (362880 + x * 0)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/main.js
var require_main81 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/main.js"(exports, module) {
    "use strict";
    var gammaLanczosSumExpGScaled = require_rational_pq4();
    module.exports = gammaLanczosSumExpGScaled;
  }
});

// node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/index.js
var require_lib116 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma-lanczos-sum-expg-scaled/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main81();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/regularised_gamma_prefix.js
var require_regularised_gamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/regularised_gamma_prefix.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var gammaln = require_lib105();
    var gamma = require_lib97();
    var log1pmx = require_lib114();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var FLOAT64_MAX = require_lib83();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function regularisedGammaPrefix(a, z) {
      var prefix;
      var amza;
      var agh;
      var alz;
      var amz;
      var sq;
      var d;
      agh = a + G - 0.5;
      d = (z - a - G + 0.5) / agh;
      if (a < 1) {
        if (z <= MIN_LN || a < 1 / FLOAT64_MAX) {
          return exp(a * ln(z) - z - gammaln(a));
        }
        return pow(z, a) * exp(-z) / gamma(a);
      }
      if (abs(d * d * a) <= 100 && a > 150) {
        prefix = a * log1pmx(d) + z * (0.5 - G) / agh;
        prefix = exp(prefix);
      } else {
        alz = a * ln(z / agh);
        amz = a - z;
        if (min(alz, amz) <= MIN_LN || max(alz, amz) >= MAX_LN) {
          amza = amz / a;
          if (min(alz, amz) / 2 > MIN_LN && max(alz, amz) / 2 < MAX_LN) {
            sq = pow(z / agh, a / 2) * exp(amz / 2);
            prefix = sq * sq;
          } else if (min(alz, amz) / 4 > MIN_LN && max(alz, amz) / 4 < MAX_LN && z > a) {
            sq = pow(z / agh, a / 4) * exp(amz / 4);
            prefix = sq * sq;
            prefix *= prefix;
          } else if (amza > MIN_LN && amza < MAX_LN) {
            prefix = pow(z * exp(amza) / agh, a);
          } else {
            prefix = exp(alz + amz);
          }
        } else {
          prefix = pow(z / agh, a) * exp(amz);
        }
      }
      prefix *= sqrt(agh / E) / lanczosSumExpGScaled(a);
      return prefix;
    }
    module.exports = regularisedGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-powm1/lib/main.js
var require_main82 = __commonJS({
  "node_modules/@stdlib/math-base-special-powm1/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isinfinite = require_lib17();
    var abs = require_lib46();
    var expm1 = require_lib64();
    var ln = require_lib59();
    var pow = require_lib75();
    var trunc = require_lib9();
    function powm1(b, x) {
      var result;
      var y;
      if (isnan(b) || isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        return 0;
      }
      if (b === 0) {
        return -1;
      }
      if (b < 0 && x % 2 === 0) {
        b = -b;
      }
      if (b > 0) {
        if (abs(x * (b - 1)) < 0.5 || abs(x) < 0.2) {
          y = ln(b) * x;
          if (y < 0.5) {
            return expm1(y);
          }
        }
      } else if (trunc(x) !== x) {
        return NaN;
      }
      result = pow(b, x) - 1;
      if (isinfinite(result) || isnan(result)) {
        return NaN;
      }
      return result;
    }
    module.exports = powm1;
  }
});

// node_modules/@stdlib/math-base-special-powm1/lib/index.js
var require_lib117 = __commonJS({
  "node_modules/@stdlib/math-base-special-powm1/lib/index.js"(exports, module) {
    "use strict";
    var powm1 = require_main82();
    module.exports = powm1;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p1q1.js
var require_rational_p1q12 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.01803556856784494;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.01803556856784494 + x * (0.02512664961998968 + x * (0.049410315156753225 + x * (0.0172491608709614 + x * (-2594535632054381e-19 + x * (-5410098692152044e-19 + x * (-3245886498259485e-20 + x * 0))))));
        s2 = 1 + x * (1.962029871977952 + x * (1.4801966942423133 + x * (0.5413914320717209 + x * (0.09885042511280101 + x * (0.008213096746488934 + x * (22493629192211576e-20 + x * -22335276320861708e-23))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (-3245886498259485e-20 + x * (-5410098692152044e-19 + x * (-2594535632054381e-19 + x * (0.0172491608709614 + x * (0.049410315156753225 + x * (0.02512664961998968 + x * -0.01803556856784494))))));
        s2 = -22335276320861708e-23 + x * (22493629192211576e-20 + x * (0.008213096746488934 + x * (0.09885042511280101 + x * (0.5413914320717209 + x * (1.4801966942423133 + x * (1.962029871977952 + x * 1))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p2q2.js
var require_rational_p2q22 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.04906224540690395;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.04906224540690395 + x * (-0.09691175301595212 + x * (-0.4149833583594954 + x * (-0.4065671242119384 + x * (-0.1584135863906922 + x * (-0.024014982064857155 + x * -0.0010034668769627955)))));
        s2 = 1 + x * (3.0234982984646304 + x * (3.4873958536072385 + x * (1.9141558827442668 + x * (0.5071377386143635 + x * (0.05770397226904519 + x * 0.001957681026011072)))));
      } else {
        x = 1 / x;
        s1 = -0.0010034668769627955 + x * (-0.024014982064857155 + x * (-0.1584135863906922 + x * (-0.4065671242119384 + x * (-0.4149833583594954 + x * (-0.09691175301595212 + x * 0.04906224540690395)))));
        s2 = 0.001957681026011072 + x * (0.05770397226904519 + x * (0.5071377386143635 + x * (1.9141558827442668 + x * (3.4873958536072385 + x * (3.0234982984646304 + x * 1)))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p3q3.js
var require_rational_p3q32 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.029232972183027003;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.029232972183027003 + x * (0.14421626775719232 + x * (-0.14244039073863127 + x * (0.05428096940550536 + x * (-0.008505359768683364 + x * (4311713426792973e-19 + x * 0)))));
        s2 = 1 + x * (-1.5016935605448505 + x * (0.846973248876495 + x * (-0.22009515181499575 + x * (0.02558279715597587 + x * (-0.0010066679553914337 + x * -8271935218912905e-22)))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (4311713426792973e-19 + x * (-0.008505359768683364 + x * (0.05428096940550536 + x * (-0.14244039073863127 + x * (0.14421626775719232 + x * -0.029232972183027003)))));
        s2 = -8271935218912905e-22 + x * (-0.0010066679553914337 + x * (0.02558279715597587 + x * (-0.22009515181499575 + x * (0.846973248876495 + x * (-1.5016935605448505 + x * 1)))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/lgamma_small_imp.js
var require_lgamma_small_imp = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/lgamma_small_imp.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var EPS = require_lib77();
    var rateval1 = require_rational_p1q12();
    var rateval2 = require_rational_p2q22();
    var rateval3 = require_rational_p3q32();
    var Y1 = 0.15896368026733398;
    var Y2 = 0.5281534194946289;
    var Y3 = 0.45201730728149414;
    function lgammaSmallImp(z, zm1, zm2) {
      var prefix;
      var result;
      var r;
      var R;
      if (z < EPS) {
        return -ln(z);
      }
      if (zm1 === 0 || zm2 === 0) {
        return 0;
      }
      result = 0;
      if (z > 2) {
        if (z >= 3) {
          do {
            z -= 1;
            zm2 -= 1;
            result += ln(z);
          } while (z >= 3);
          zm2 = z - 2;
        }
        r = zm2 * (z + 1);
        R = rateval1(zm2);
        result += r * Y1 + r * R;
        return result;
      }
      if (z < 1) {
        result += -ln(z);
        zm2 = zm1;
        zm1 = z;
        z += 1;
      }
      if (z <= 1.5) {
        r = rateval2(zm1);
        prefix = zm1 * zm2;
        result += prefix * Y2 + prefix * r;
        return result;
      }
      r = zm2 * zm1;
      R = rateval3(-zm2);
      result += r * Y3 + r * R;
      return result;
    }
    module.exports = lgammaSmallImp;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/main.js
var require_main83 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/main.js"(exports, module) {
    "use strict";
    var gamma = require_lib97();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var isnan = require_lib6();
    var lgammaSmallImp = require_lgamma_small_imp();
    function gamma1pm1(x) {
      if (isnan(x)) {
        return NaN;
      }
      if (x < 0) {
        if (x < -0.5) {
          return gamma(1 + x) - 1;
        }
        return expm1(-log1p(x) + lgammaSmallImp(x + 2, x + 1, x));
      }
      if (x < 2) {
        return expm1(lgammaSmallImp(x + 1, x, x - 1));
      }
      return gamma(1 + x) - 1;
    }
    module.exports = gamma1pm1;
  }
});

// node_modules/@stdlib/math-base-special-gamma1pm1/lib/index.js
var require_lib118 = __commonJS({
  "node_modules/@stdlib/math-base-special-gamma1pm1/lib/index.js"(exports, module) {
    "use strict";
    var gamma1pm1 = require_main83();
    module.exports = gamma1pm1;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/small_gamma2_series.js
var require_small_gamma2_series = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/small_gamma2_series.js"(exports, module) {
    "use strict";
    function smallGamma2Series(a, x) {
      var result;
      var apn;
      var n;
      var r;
      result = -x;
      x = -x;
      apn = a + 1;
      n = 1;
      return next;
      function next() {
        r = result / apn;
        result *= x;
        n += 1;
        result /= n;
        apn += 1;
        return r;
      }
    }
    module.exports = smallGamma2Series;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_small_upper_part.js
var require_tgamma_small_upper_part = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/tgamma_small_upper_part.js"(exports, module) {
    "use strict";
    var powm1 = require_lib117();
    var sumSeries = require_lib110();
    var gamma1pm1 = require_lib118();
    var smallGamma2Series = require_small_gamma2_series();
    function tgammaSmallUpperPart(a, x, invert) {
      var initialValue;
      var result;
      var pgam;
      var p;
      var s;
      result = gamma1pm1(a);
      pgam = (result + 1) / a;
      p = powm1(x, a);
      result -= p;
      result /= a;
      s = smallGamma2Series(a, x);
      p += 1;
      initialValue = invert ? pgam : 0;
      result = -p * sumSeries(s, {
        "initialValue": (initialValue - result) / p
      });
      if (invert) {
        result = -result;
      }
      return [result, pgam];
    }
    module.exports = tgammaSmallUpperPart;
  }
});

// node_modules/@stdlib/constants-float32-smallest-normal/lib/index.js
var require_lib119 = __commonJS({
  "node_modules/@stdlib/constants-float32-smallest-normal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT32_SMALLEST_NORMAL = 11754943508222875e-54;
    module.exports = FLOAT32_SMALLEST_NORMAL;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/generators.js
var require_generators2 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/generators.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var FLOAT32_SMALLEST_NORMAL = require_lib119();
    var EPS = require_lib77();
    var MAX_ITER = 1e6;
    function continuedFractionA(gen, factor, maxIter) {
      var isgenerator;
      var delta;
      var a0;
      var f;
      var C;
      var D;
      var v;
      isgenerator = typeof gen.next === "function";
      v = isgenerator ? gen.next().value : gen();
      f = v[1];
      a0 = v[0];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      if (isgenerator === true) {
        do {
          v = gen.next().value;
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (abs(delta - 1) > factor && --maxIter);
      } else {
        do {
          v = gen();
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      }
      return a0 / f;
    }
    function continuedFractionB(gen, factor, maxIter) {
      var isgenerator;
      var delta;
      var f;
      var C;
      var D;
      var v;
      isgenerator = typeof gen.next === "function";
      v = isgenerator ? gen.next().value : gen();
      f = v[1];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      if (isgenerator === true) {
        do {
          v = gen.next().value;
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      } else {
        do {
          v = gen();
          if (v) {
            D = v[1] + v[0] * D;
            if (D === 0) {
              D = FLOAT32_SMALLEST_NORMAL;
            }
            C = v[1] + v[0] / C;
            if (C === 0) {
              C = FLOAT32_SMALLEST_NORMAL;
            }
            D = 1 / D;
            delta = C * D;
            f *= delta;
          }
        } while (v && abs(delta - 1) > factor && --maxIter);
      }
      return f;
    }
    function continuedFraction(generator, options) {
      var maxIter;
      var opts;
      var eps;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      maxIter = opts.maxIter || MAX_ITER;
      eps = opts.tolerance || EPS;
      if (opts.keep) {
        return continuedFractionB(generator, eps, maxIter);
      }
      return continuedFractionA(generator, eps, maxIter);
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/basic.js
var require_basic2 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/basic.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var EPS = require_lib77();
    var FLOAT32_SMALLEST_NORMAL = require_lib119();
    var MAX_ITER = 1e6;
    function continuedFractionA(gen, factor, maxIter) {
      var delta;
      var a0;
      var C;
      var D;
      var f;
      var v;
      v = gen();
      f = v[1];
      a0 = v[0];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      do {
        v = gen();
        if (v) {
          D = v[1] + v[0] * D;
          if (D === 0) {
            D = FLOAT32_SMALLEST_NORMAL;
          }
          C = v[1] + v[0] / C;
          if (C === 0) {
            C = FLOAT32_SMALLEST_NORMAL;
          }
          D = 1 / D;
          delta = C * D;
          f *= delta;
        }
      } while (v && abs(delta - 1) > factor && --maxIter);
      return a0 / f;
    }
    function continuedFractionB(gen, factor, maxIter) {
      var delta;
      var C;
      var D;
      var f;
      var v;
      v = gen();
      f = v[1];
      if (f === 0) {
        f = FLOAT32_SMALLEST_NORMAL;
      }
      C = f;
      D = 0;
      do {
        v = gen();
        if (v) {
          D = v[1] + v[0] * D;
          if (D === 0) {
            D = FLOAT32_SMALLEST_NORMAL;
          }
          C = v[1] + v[0] / C;
          if (C === 0) {
            C = FLOAT32_SMALLEST_NORMAL;
          }
          D = 1 / D;
          delta = C * D;
          f *= delta;
        }
      } while (v && abs(delta - 1) > factor && --maxIter);
      return f;
    }
    function continuedFraction(generator, options) {
      var maxIter;
      var opts;
      var eps;
      opts = {};
      if (arguments.length > 1) {
        opts = options;
      }
      eps = opts.tolerance || EPS;
      maxIter = opts.maxIter || MAX_ITER;
      if (opts.keep) {
        return continuedFractionB(generator, eps, maxIter);
      }
      return continuedFractionA(generator, eps, maxIter);
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-tools-continued-fraction/lib/index.js
var require_lib120 = __commonJS({
  "node_modules/@stdlib/math-base-tools-continued-fraction/lib/index.js"(exports, module) {
    "use strict";
    var hasGeneratorSupport = require_lib109();
    var generator = require_generators2();
    var basic = require_basic2();
    var continuedFraction;
    if (hasGeneratorSupport()) {
      continuedFraction = generator;
    } else {
      continuedFraction = basic;
    }
    module.exports = continuedFraction;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/upper_incomplete_gamma_fract.js
var require_upper_incomplete_gamma_fract = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/upper_incomplete_gamma_fract.js"(exports, module) {
    "use strict";
    function upperIncompleteGammaFract(a1, z1) {
      var z = z1 - a1 + 1;
      var a = a1;
      var k = 0;
      return next;
      function next() {
        k += 1;
        z += 2;
        return [
          k * (a - k),
          z
        ];
      }
    }
    module.exports = upperIncompleteGammaFract;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/upper_gamma_fraction.js
var require_upper_gamma_fraction = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/upper_gamma_fraction.js"(exports, module) {
    "use strict";
    var continuedFraction = require_lib120();
    var upperIncompleteGammaFract = require_upper_incomplete_gamma_fract();
    function upperGammaFraction(a, z) {
      var f = upperIncompleteGammaFract(a, z);
      return 1 / (z - a + 1 + continuedFraction(f));
    }
    module.exports = upperGammaFraction;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/igamma_final.js
var require_igamma_final = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/igamma_final.js"(exports, module) {
    "use strict";
    var floor = require_lib7();
    var gamma = require_lib97();
    var abs = require_lib46();
    var pow = require_lib75();
    var ln = require_lib59();
    var SQRT_EPSILON = require_lib107();
    var FLOAT64_MAX = require_lib83();
    var MAX_LN = require_lib106();
    var tgammaILargeX = require_tgamma_i_large_x();
    var finiteGammaQ = require_finite_gamma_q();
    var finiteHalfGammaQ = require_finite_half_gamma_q();
    var fullIGammaPrefix = require_full_igamma_prefix();
    var igammaTemmeLarge = require_igamma_temme_large();
    var lowerGammaSeries = require_lower_gamma_series();
    var regularisedGammaPrefix = require_regularised_gamma_prefix();
    var tgammaSmallUpperPart = require_tgamma_small_upper_part();
    var upperGammaFraction = require_upper_gamma_fraction();
    function igammaFinal(x, a, regularized, upper) {
      var optimisedInvert;
      var evalMethod;
      var isHalfInt;
      var initValue;
      var useTemme;
      var isSmallA;
      var result;
      var invert;
      var isInt;
      var sigma;
      var res;
      var gam;
      var fa;
      var g;
      result = 0;
      invert = upper;
      isSmallA = a < 30 && a <= x + 1 && x < MAX_LN;
      if (isSmallA) {
        fa = floor(a);
        isInt = fa === a;
        isHalfInt = isInt ? false : abs(fa - a) === 0.5;
      } else {
        isInt = false;
        isHalfInt = false;
      }
      if (isInt && x > 0.6) {
        invert = !invert;
        evalMethod = 0;
      } else if (isHalfInt && x > 0.2) {
        invert = !invert;
        evalMethod = 1;
      } else if (x < SQRT_EPSILON && a > 1) {
        evalMethod = 6;
      } else if (x > 1e3 && (a < x || abs(a - 50) / x < 1)) {
        invert = !invert;
        evalMethod = 7;
      } else if (x < 0.5) {
        if (-0.4 / ln(x) < a) {
          evalMethod = 2;
        } else {
          evalMethod = 3;
        }
      } else if (x < 1.1) {
        if (x * 0.75 < a) {
          evalMethod = 2;
        } else {
          evalMethod = 3;
        }
      } else {
        useTemme = false;
        if (regularized && a > 20) {
          sigma = abs((x - a) / a);
          if (a > 200) {
            if (20 / a > sigma * sigma) {
              useTemme = true;
            }
          } else if (sigma < 0.4) {
            useTemme = true;
          }
        }
        if (useTemme) {
          evalMethod = 5;
        } else if (x - 1 / (3 * x) < a) {
          evalMethod = 2;
        } else {
          evalMethod = 4;
          invert = !invert;
        }
      }
      switch (evalMethod) {
        case 0:
          result = finiteGammaQ(a, x);
          if (regularized === false) {
            result *= gamma(a);
          }
          break;
        case 1:
          result = finiteHalfGammaQ(a, x);
          if (regularized === false) {
            result *= gamma(a);
          }
          break;
        case 2:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          if (result !== 0) {
            initValue = 0;
            optimisedInvert = false;
            if (invert) {
              initValue = regularized ? 1 : gamma(a);
              if (regularized || result >= 1 || FLOAT64_MAX * result > initValue) {
                initValue /= result;
                if (regularized || a < 1 || FLOAT64_MAX / a > initValue) {
                  initValue *= -a;
                  optimisedInvert = true;
                } else {
                  initValue = 0;
                }
              } else {
                initValue = 0;
              }
            }
            result *= lowerGammaSeries(a, x, initValue) / a;
            if (optimisedInvert) {
              invert = false;
              result = -result;
            }
          }
          break;
        case 3:
          invert = !invert;
          res = tgammaSmallUpperPart(a, x, invert);
          result = res[0];
          g = res[1];
          invert = false;
          if (regularized) {
            result /= g;
          }
          break;
        case 4:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          if (result !== 0) {
            result *= upperGammaFraction(a, x);
          }
          break;
        case 5:
          result = igammaTemmeLarge(a, x);
          if (x >= a) {
            invert = !invert;
          }
          break;
        case 6:
          result = regularized ? pow(x, a) / gamma(a + 1) : pow(x, a) / a;
          result *= 1 - a * x / (a + 1);
          break;
        case 7:
          result = regularized ? regularisedGammaPrefix(a, x) : fullIGammaPrefix(a, x);
          result /= x;
          if (result !== 0) {
            result *= tgammaILargeX(a, x);
          }
          break;
      }
      if (regularized && result > 1) {
        result = 1;
      }
      if (invert) {
        gam = regularized ? 1 : gamma(a);
        result = gam - result;
      }
      return result;
    }
    module.exports = igammaFinal;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/main.js
var require_main84 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/main.js"(exports, module) {
    "use strict";
    var gammaln = require_lib105();
    var exp = require_lib51();
    var ln = require_lib59();
    var SQRT_TWO_PI = require_lib95();
    var MAX_LN = require_lib106();
    var PINF = require_lib12();
    var FLOAT64_MAX_NTH_FACTORIAL = require_lib98();
    var igammaFinal = require_igamma_final();
    var lowerGammaSeries = require_lower_gamma_series();
    var upperGammaFraction = require_upper_gamma_fraction();
    function gammainc(x, a, regularized, upper) {
      var normalized;
      var initValue;
      var invert;
      var result;
      if (x < 0 || a <= 0) {
        return NaN;
      }
      normalized = regularized === void 0 ? true : regularized;
      invert = upper;
      if (a >= FLOAT64_MAX_NTH_FACTORIAL && !normalized) {
        if (invert && a * 4 < x) {
          result = a * ln(x) - x;
          result += ln(upperGammaFraction(a, x));
        } else if (!invert && a > 4 * x) {
          result = a * ln(x) - x;
          initValue = 0;
          result += ln(lowerGammaSeries(a, x, initValue) / a);
        } else {
          result = igammaFinal(x, a, true, invert);
          if (result === 0) {
            if (invert) {
              result = 1 + 1 / (12 * a) + 1 / (288 * a * a);
              result = ln(result) - a + (a - 0.5) * ln(a);
              result += ln(SQRT_TWO_PI);
            } else {
              result = a * ln(x) - x;
              initValue = 0;
              result += ln(lowerGammaSeries(a, x, initValue) / a);
            }
          } else {
            result = ln(result) + gammaln(a);
          }
        }
        if (result > MAX_LN) {
          return PINF;
        }
        return exp(result);
      }
      return igammaFinal(x, a, normalized, invert);
    }
    module.exports = gammainc;
  }
});

// node_modules/@stdlib/math-base-special-gammainc/lib/index.js
var require_lib121 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammainc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main84();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/full_igamma_prefix.js
var require_full_igamma_prefix2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/full_igamma_prefix.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    function fullIGammaPrefix(a, z) {
      var prefix;
      var alz;
      alz = a * ln(z);
      if (z >= 1) {
        if (alz < MAX_LN && -z > MIN_LN) {
          prefix = pow(z, a) * exp(-z);
        } else if (a >= 1) {
          prefix = pow(z / exp(z / a), a);
        } else {
          prefix = exp(alz - z);
        }
      } else if (alz > MIN_LN) {
        prefix = pow(z, a) * exp(-z);
      } else if (z / a < MAX_LN) {
        prefix = pow(z / exp(z / a), a);
      } else {
        prefix = exp(alz - z);
      }
      return prefix;
    }
    module.exports = fullIGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/regularized_gamma_prefix.js
var require_regularized_gamma_prefix = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/regularized_gamma_prefix.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var gammaln = require_lib105();
    var gamma = require_lib97();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function regularizedGammaPrefix(a, z) {
      var prefix;
      var amza;
      var agh;
      var alz;
      var amz;
      var sq;
      var d;
      agh = a + G - 0.5;
      d = (z - a - G + 0.5) / agh;
      if (a < 1) {
        if (z <= MIN_LN) {
          return exp(a * ln(z) - z - gammaln(a));
        }
        return pow(z, a) * exp(-z) / gamma(a);
      }
      if (abs(d * d * a) <= 100 && a > 150) {
        prefix = a * (log1p(d) - d) + z * (0.5 - G) / agh;
        prefix = exp(prefix);
      } else {
        alz = a * ln(z / agh);
        amz = a - z;
        if (min(alz, amz) <= MIN_LN || max(alz, amz) >= MAX_LN) {
          amza = amz / a;
          if (min(alz, amz) / 2 > MIN_LN && max(alz, amz) / 2 < MAX_LN) {
            sq = pow(z / agh, a / 2) * exp(amz / 2);
            prefix = sq * sq;
          } else if (min(alz, amz) / 4 > MIN_LN && max(alz, amz) / 4 < MAX_LN && z > a) {
            sq = pow(z / agh, a / 4) * exp(amz / 4);
            prefix = sq * sq;
            prefix *= prefix;
          } else if (amza > MIN_LN && amza < MAX_LN) {
            prefix = pow(z * exp(amza) / agh, a);
          } else {
            prefix = exp(alz + amz);
          }
        } else {
          prefix = pow(z / agh, a) * exp(amz);
        }
      }
      prefix *= sqrt(agh / E) / lanczosSumExpGScaled(a);
      return prefix;
    }
    module.exports = regularizedGammaPrefix;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/beta_small_b_large_a_series.js
var require_beta_small_b_large_a_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/beta_small_b_large_a_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var factorial = require_lib99();
    var gammainc = require_lib121();
    var log1p = require_lib65();
    var abs = require_lib46();
    var pow = require_lib75();
    var ln = require_lib59();
    var MIN_VALUE = require_lib45();
    var EPSILON = require_lib77();
    var fullIGammaPrefix = require_full_igamma_prefix2();
    var regularizedGammaPrefix = require_regularized_gamma_prefix();
    var p = new Array(30);
    function betaSmallBLargeASeries(a, b, x, y, s0, mult, normalized) {
      var prefix;
      var tmp1;
      var tnp1;
      var sum;
      var b2n;
      var bm1;
      var lx2;
      var lxp;
      var mbn;
      var lx;
      var t4;
      var h;
      var j;
      var m;
      var n;
      var r;
      var t;
      var u;
      bm1 = b - 1;
      t = a + bm1 / 2;
      if (y < 0.35) {
        lx = log1p(-y);
      } else {
        lx = ln(x);
      }
      u = -t * lx;
      h = regularizedGammaPrefix(b, u);
      if (h <= MIN_VALUE) {
        return s0;
      }
      if (normalized) {
        prefix = h / gammaDeltaRatio(a, b);
        prefix /= pow(t, b);
      } else {
        prefix = fullIGammaPrefix(b, u) / pow(t, b);
      }
      prefix *= mult;
      p[0] = 1;
      j = gammainc(u, b, true, true);
      j /= h;
      sum = s0 + prefix * j;
      tnp1 = 1;
      lx2 = lx / 2;
      lx2 *= lx2;
      lxp = 1;
      t4 = 4 * t * t;
      b2n = b;
      for (n = 1; n < p.length; ++n) {
        tnp1 += 2;
        p[n] = 0;
        mbn = b - n;
        tmp1 = 3;
        for (m = 1; m < n; ++m) {
          mbn = m * b - n;
          p[n] += mbn * p[n - m] / factorial(tmp1);
          tmp1 += 2;
        }
        p[n] /= n;
        p[n] += bm1 / factorial(tnp1);
        j = (b2n * (b2n + 1) * j + (u + b2n + 1) * lxp) / t4;
        lxp *= lx2;
        b2n += 2;
        r = prefix * p[n] * j;
        sum += r;
        if (r > 1) {
          if (abs(r) < abs(EPSILON * sum)) {
            break;
          }
        } else if (abs(r / EPSILON) < abs(sum)) {
          break;
        }
      }
      return sum;
    }
    module.exports = betaSmallBLargeASeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/rising_factorial_ratio.js
var require_rising_factorial_ratio = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/rising_factorial_ratio.js"(exports, module) {
    "use strict";
    function risingFactorialRatio(a, b, k) {
      var result;
      var i;
      if (k === 0) {
        return 1;
      }
      result = 1;
      for (i = 0; i < k; i++) {
        result *= (a + i) / (b + i);
      }
      return result;
    }
    module.exports = risingFactorialRatio;
  }
});

// node_modules/@stdlib/math-base-special-maxabs/lib/main.js
var require_main85 = __commonJS({
  "node_modules/@stdlib/math-base-special-maxabs/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var max = require_lib80();
    function maxabs(x, y) {
      return max(abs(x), abs(y));
    }
    module.exports = maxabs;
  }
});

// node_modules/@stdlib/math-base-special-maxabs/lib/index.js
var require_lib122 = __commonJS({
  "node_modules/@stdlib/math-base-special-maxabs/lib/index.js"(exports, module) {
    "use strict";
    var maxabs = require_main85();
    module.exports = maxabs;
  }
});

// node_modules/@stdlib/math-base-special-minabs/lib/main.js
var require_main86 = __commonJS({
  "node_modules/@stdlib/math-base-special-minabs/lib/main.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var min = require_lib82();
    function minabs(x, y) {
      return min(abs(x), abs(y));
    }
    module.exports = minabs;
  }
});

// node_modules/@stdlib/math-base-special-minabs/lib/index.js
var require_lib123 = __commonJS({
  "node_modules/@stdlib/math-base-special-minabs/lib/index.js"(exports, module) {
    "use strict";
    var minabs = require_main86();
    module.exports = minabs;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_power_terms.js
var require_ibeta_power_terms = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_power_terms.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var maxabs = require_lib122();
    var minabs = require_lib123();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var min = require_lib82();
    var ln = require_lib59();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    function ibetaPowerTerms(a, b, x, y, normalized) {
      var result;
      var smallA;
      var ratio;
      var agh;
      var bgh;
      var cgh;
      var l1;
      var l2;
      var l3;
      var p1;
      var b1;
      var b2;
      var c;
      var l;
      if (!normalized) {
        return pow(x, a) * pow(y, b);
      }
      c = a + b;
      agh = a + G - 0.5;
      bgh = b + G - 0.5;
      cgh = c + G - 0.5;
      result = lanczosSumExpGScaled(c);
      result /= lanczosSumExpGScaled(a) * lanczosSumExpGScaled(b);
      result *= sqrt(bgh / E);
      result *= sqrt(agh / cgh);
      l1 = (x * b - y * agh) / agh;
      l2 = (y * a - x * bgh) / bgh;
      if (minabs(l1, l2) < 0.2) {
        if (l1 * l2 > 0 || min(a, b) < 1) {
          if (abs(l1) < 0.1) {
            result *= exp(a * log1p(l1));
          } else {
            result *= pow(x * cgh / agh, a);
          }
          if (abs(l2) < 0.1) {
            result *= exp(b * log1p(l2));
          } else {
            result *= pow(y * cgh / bgh, b);
          }
        } else if (maxabs(l1, l2) < 0.5) {
          smallA = a < b;
          ratio = b / a;
          if (smallA && ratio * l2 < 0.1 || !smallA && l1 / ratio > 0.1) {
            l3 = expm1(ratio * log1p(l2));
            l3 = l1 + l3 + l3 * l1;
            l3 = a * log1p(l3);
            result *= exp(l3);
          } else {
            l3 = expm1(log1p(l1) / ratio);
            l3 = l2 + l3 + l3 * l2;
            l3 = b * log1p(l3);
            result *= exp(l3);
          }
        } else if (abs(l1) < abs(l2)) {
          l = a * log1p(l1) + b * ln(y * cgh / bgh);
          if (l <= MIN_LN || l >= MAX_LN) {
            l += ln(result);
            if (l >= MAX_LN) {
              return NaN;
            }
            result = exp(l);
          } else {
            result *= exp(l);
          }
        } else {
          l = b * log1p(l2) + a * ln(x * cgh / agh);
          if (l <= MIN_LN || l >= MAX_LN) {
            l += ln(result);
            if (l >= MAX_LN) {
              return NaN;
            }
            result = exp(l);
          } else {
            result *= exp(l);
          }
        }
      } else {
        b1 = x * cgh / agh;
        b2 = y * cgh / bgh;
        l1 = a * ln(b1);
        l2 = b * ln(b2);
        if (l1 >= MAX_LN || l1 <= MIN_LN || l2 >= MAX_LN || l2 <= MIN_LN) {
          if (a < b) {
            p1 = pow(b2, b / a);
            l3 = a * (ln(b1) + ln(p1));
            if (l3 < MAX_LN && l3 > MIN_LN) {
              result *= pow(p1 * b1, a);
            } else {
              l2 += l1 + ln(result);
              if (l2 >= MAX_LN) {
                return NaN;
              }
              result = exp(l2);
            }
          } else {
            p1 = pow(b1, a / b);
            l3 = (ln(p1) + ln(b2)) * b;
            if (l3 < MAX_LN && l3 > MIN_LN) {
              result *= pow(p1 * b2, b);
            } else {
              l2 += l1 + ln(result);
              if (l2 >= MAX_LN) {
                return NaN;
              }
              result = exp(l2);
            }
          }
        } else {
          result *= pow(b1, a) * pow(b2, b);
        }
      }
      return result;
    }
    module.exports = ibetaPowerTerms;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_fraction2.js
var require_ibeta_fraction2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_fraction2.js"(exports, module) {
    "use strict";
    var continuedFraction = require_lib120();
    var ibetaPowerTerms = require_ibeta_power_terms();
    var OPTS = {
      "keep": true,
      "maxIter": 1e3
    };
    function ibetaFraction2t(a, b, x, y) {
      var m = 0;
      return next;
      function next() {
        var denom;
        var aN;
        var bN;
        aN = (a + m - 1) * (a + b + m - 1) * m * (b - m) * x * x;
        denom = a + 2 * m - 1;
        aN /= denom * denom;
        bN = m;
        bN += m * (b - m) * x / (a + 2 * m - 1);
        bN += (a + m) * (a * y - b * x + 1 + m * (2 - x)) / (a + 2 * m + 1);
        m += 1;
        return [aN, bN];
      }
    }
    function ibetaFraction2(a, b, x, y, normalized, out) {
      var result;
      var fract;
      var f;
      result = ibetaPowerTerms(a, b, x, y, normalized);
      if (out) {
        out[1] = result;
      }
      if (result === 0) {
        return result;
      }
      f = ibetaFraction2t(a, b, x, y);
      fract = continuedFraction(f, OPTS);
      return result / fract;
    }
    module.exports = ibetaFraction2;
  }
});

// node_modules/@stdlib/constants-float64-max-safe-integer/lib/index.js
var require_lib124 = __commonJS({
  "node_modules/@stdlib/constants-float64-max-safe-integer/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_MAX_SAFE_INTEGER = 9007199254740991;
    module.exports = FLOAT64_MAX_SAFE_INTEGER;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/bitwise_binary_gcd.js
var require_bitwise_binary_gcd = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/bitwise_binary_gcd.js"(exports, module) {
    "use strict";
    function gcd(a, b) {
      var k = 0;
      var t;
      if (a === 0) {
        return b;
      }
      if (b === 0) {
        return a;
      }
      while ((a & 1) === 0 && (b & 1) === 0) {
        a >>>= 1;
        b >>>= 1;
        k += 1;
      }
      while ((a & 1) === 0) {
        a >>>= 1;
      }
      while (b) {
        while ((b & 1) === 0) {
          b >>>= 1;
        }
        if (a > b) {
          t = b;
          b = a;
          a = t;
        }
        b -= a;
      }
      return a << k;
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/binary_gcd.js
var require_binary_gcd = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/binary_gcd.js"(exports, module) {
    "use strict";
    function gcd(a, b) {
      var k = 1;
      var t;
      if (a === 0) {
        return b;
      }
      if (b === 0) {
        return a;
      }
      while (a % 2 === 0 && b % 2 === 0) {
        a /= 2;
        b /= 2;
        k *= 2;
      }
      while (a % 2 === 0) {
        a /= 2;
      }
      while (b) {
        while (b % 2 === 0) {
          b /= 2;
        }
        if (a > b) {
          t = b;
          b = a;
          a = t;
        }
        b -= a;
      }
      return k * a;
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/main.js
var require_main87 = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var isInteger = require_lib68();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var INT32_MAX = require_lib84();
    var bitwise = require_bitwise_binary_gcd();
    var largeIntegers = require_binary_gcd();
    function gcd(a, b) {
      if (isnan(a) || isnan(b)) {
        return NaN;
      }
      if (a === PINF || b === PINF || a === NINF || b === NINF) {
        return NaN;
      }
      if (!(isInteger(a) && isInteger(b))) {
        return NaN;
      }
      if (a < 0) {
        a = -a;
      }
      if (b < 0) {
        b = -b;
      }
      if (a <= INT32_MAX && b <= INT32_MAX) {
        return bitwise(a, b);
      }
      return largeIntegers(a, b);
    }
    module.exports = gcd;
  }
});

// node_modules/@stdlib/math-base-special-gcd/lib/index.js
var require_lib125 = __commonJS({
  "node_modules/@stdlib/math-base-special-gcd/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main87();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-binomcoef/lib/main.js
var require_main88 = __commonJS({
  "node_modules/@stdlib/math-base-special-binomcoef/lib/main.js"(exports, module) {
    "use strict";
    var MAX_SAFE_INTEGER = require_lib124();
    var PINF = require_lib12();
    var isInteger = require_lib68();
    var isnan = require_lib6();
    var isOdd = require_lib70();
    var floor = require_lib7();
    var gcd = require_lib125();
    function binomcoef(n, k) {
      var res;
      var sgn;
      var b;
      var c;
      var d;
      var g;
      var s;
      if (isnan(n) || isnan(k)) {
        return NaN;
      }
      if (!isInteger(n) || !isInteger(k)) {
        return NaN;
      }
      if (k < 0) {
        return 0;
      }
      sgn = 1;
      if (n < 0) {
        n = -n + k - 1;
        if (isOdd(k)) {
          sgn *= -1;
        }
      }
      if (k > n) {
        return 0;
      }
      if (k === 0 || k === n) {
        return sgn;
      }
      if (k === 1 || k === n - 1) {
        return sgn * n;
      }
      if (n - k < k) {
        k = n - k;
      }
      s = floor(MAX_SAFE_INTEGER / n);
      res = 1;
      for (d = 1; d <= k; d++) {
        if (res > s) {
          break;
        }
        res *= n;
        res /= d;
        n -= 1;
      }
      if (d > k) {
        return sgn * res;
      }
      b = binomcoef(n, k - d + 1);
      if (b === PINF) {
        return sgn * b;
      }
      c = binomcoef(k, k - d + 1);
      g = gcd(b, c);
      b /= g;
      c /= g;
      res /= c;
      return sgn * res * b;
    }
    module.exports = binomcoef;
  }
});

// node_modules/@stdlib/math-base-special-binomcoef/lib/index.js
var require_lib126 = __commonJS({
  "node_modules/@stdlib/math-base-special-binomcoef/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main88();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/binomial_ccdf.js
var require_binomial_ccdf = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/binomial_ccdf.js"(exports, module) {
    "use strict";
    var binomcoef = require_lib126();
    var floor = require_lib7();
    var pow = require_lib75();
    var MIN_VALUE = require_lib45();
    function binomialCCDF(n, k, x, y) {
      var startTerm;
      var result;
      var start;
      var term;
      var i;
      result = pow(x, n);
      if (result > MIN_VALUE) {
        term = result;
        for (i = floor(n - 1); i > k; i--) {
          term *= (i + 1) * y / ((n - i) * x);
          result += term;
        }
      } else {
        start = floor(n * x);
        if (start <= k + 1) {
          start = floor(k + 2);
        }
        result = pow(x, start) * pow(y, n - start);
        result *= binomcoef(floor(n), floor(start));
        if (result === 0) {
          for (i = start - 1; i > k; i--) {
            result += pow(x, i) * pow(y, n - i);
            result *= binomcoef(floor(n), floor(i));
          }
        } else {
          term = result;
          startTerm = result;
          for (i = start - 1; i > k; i--) {
            term *= (i + 1) * y / ((n - i) * x);
            result += term;
          }
          term = startTerm;
          for (i = start + 1; i <= n; i++) {
            term *= (n - i + 1) * x / (i * y);
            result += term;
          }
        }
      }
      return result;
    }
    module.exports = binomialCCDF;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_a_step.js
var require_ibeta_a_step = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_a_step.js"(exports, module) {
    "use strict";
    var ibetaPowerTerms = require_ibeta_power_terms();
    function ibetaAStep(a, b, x, y, k, normalized, out) {
      var prefix;
      var term;
      var sum;
      var i;
      prefix = ibetaPowerTerms(a, b, x, y, normalized);
      if (out) {
        out[1] = prefix;
      }
      prefix /= a;
      if (prefix === 0) {
        return prefix;
      }
      sum = 1;
      term = 1;
      for (i = 0; i < k - 1; ++i) {
        term *= (a + b + i) * x / (a + i + 1);
        sum += term;
      }
      prefix *= sum;
      return prefix;
    }
    module.exports = ibetaAStep;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_series.js
var require_ibeta_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/ibeta_series.js"(exports, module) {
    "use strict";
    var lanczosSumExpGScaled = require_lib116();
    var sumSeries = require_lib110();
    var log1p = require_lib65();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var pow = require_lib75();
    var ln = require_lib59();
    var MIN_VALUE = require_lib45();
    var MAX_LN = require_lib106();
    var MIN_LN = require_lib111();
    var G = require_lib101();
    var E = require_lib76();
    var opts = {
      "maxTerms": 100
    };
    function ibetaSeriesT(a, b, x, result) {
      var poch = 1 - b;
      var n = 1;
      return next;
      function next() {
        var r = result / a;
        a += 1;
        result *= poch * x / n;
        n += 1;
        poch += 1;
        return r;
      }
    }
    function ibetaSeries(a, b, x, s0, normalized, out, y) {
      var result;
      var agh;
      var bgh;
      var cgh;
      var l1;
      var l2;
      var c;
      var s;
      if (normalized) {
        c = a + b;
        agh = a + G - 0.5;
        bgh = b + G - 0.5;
        cgh = c + G - 0.5;
        result = lanczosSumExpGScaled(c) / (lanczosSumExpGScaled(a) * lanczosSumExpGScaled(b));
        l1 = ln(cgh / bgh) * (b - 0.5);
        l2 = ln(x * cgh / agh) * a;
        if (l1 > MIN_LN && l1 < MAX_LN && l2 > MIN_LN && l2 < MAX_LN) {
          if (a * b < bgh * 10) {
            result *= exp((b - 0.5) * log1p(a / bgh));
          } else {
            result *= pow(cgh / bgh, b - 0.5);
          }
          result *= pow(x * cgh / agh, a);
          result *= sqrt(agh / E);
          if (out) {
            out[1] = result * pow(y, b);
          }
        } else {
          result = ln(result) + l1 + l2 + (ln(agh) - 1) / 2;
          if (out) {
            out[1] = exp(result + b * ln(y));
          }
          result = exp(result);
        }
      } else {
        result = pow(x, a);
      }
      if (result < MIN_VALUE) {
        return s0;
      }
      s = ibetaSeriesT(a, b, x, result);
      opts.initialValue = s0;
      return sumSeries(s, opts);
    }
    module.exports = ibetaSeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/assign.js
var require_assign3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/assign.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var expm1 = require_lib64();
    var floor = require_lib7();
    var log1p = require_lib65();
    var asin = require_lib67();
    var beta = require_lib78();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var pow = require_lib75();
    var max = require_lib80();
    var min = require_lib82();
    var MAX_FLOAT64 = require_lib83();
    var MIN_FLOAT64 = require_lib45();
    var MAX_INT32 = require_lib84();
    var HALF_PI = require_lib85();
    var PI = require_lib86();
    var betaSmallBLargeASeries = require_beta_small_b_large_a_series();
    var risingFactorialRatio = require_rising_factorial_ratio();
    var ibetaPowerTerms = require_ibeta_power_terms();
    var ibetaFraction2 = require_ibeta_fraction2();
    var binomialCCDF = require_binomial_ccdf();
    var ibetaAStep = require_ibeta_a_step();
    var ibetaSeries = require_ibeta_series();
    var ONE_OVER_PI = 1 / PI;
    function ibetaImp(x, a, b, regularized, upper, out, stride, offset) {
      var lambda;
      var prefix;
      var fract;
      var bbar;
      var div;
      var tmp;
      var i0;
      var i1;
      var k;
      var n;
      var p;
      var y;
      y = 1 - x;
      i0 = offset;
      i1 = offset + stride;
      out[i1] = -1;
      if (isnan(x) || x < 0 || x > 1) {
        out[i0] = NaN;
        out[i1] = NaN;
        return out;
      }
      if (regularized) {
        if (a < 0 || b < 0) {
          out[i0] = NaN;
          out[i1] = NaN;
          return out;
        }
        if (a === 0) {
          if (b === 0) {
            out[i0] = NaN;
            out[i1] = NaN;
            return out;
          }
          if (b > 0) {
            out[i0] = upper ? 0 : 1;
            return out;
          }
        } else if (b === 0) {
          if (a > 0) {
            out[i0] = upper ? 1 : 0;
            return out;
          }
        }
      } else if (a <= 0 || b <= 0) {
        out[i0] = NaN;
        out[i1] = NaN;
        return out;
      }
      if (x === 0) {
        if (a === 1) {
          out[i1] = 1;
        } else {
          out[i1] = a < 1 ? MAX_FLOAT64 / 2 : MIN_FLOAT64 * 2;
        }
        if (upper) {
          out[i0] = regularized ? 1 : beta(a, b);
          return out;
        }
        out[i0] = 0;
        return out;
      }
      if (x === 1) {
        if (b === 1) {
          out[i1] = 1;
        } else {
          out[i1] = b < 1 ? MAX_FLOAT64 / 2 : MIN_FLOAT64 * 2;
        }
        if (upper) {
          out[i0] = 0;
        } else {
          out[i0] = regularized ? 1 : beta(a, b);
        }
        return out;
      }
      if (a === 0.5 && b === 0.5) {
        out[i1] = ONE_OVER_PI * sqrt(y * x);
        p = upper ? asin(sqrt(y)) : asin(sqrt(x));
        p /= HALF_PI;
        if (!regularized) {
          p *= PI;
        }
        out[i0] = p;
        return out;
      }
      if (a === 1) {
        tmp = b;
        b = a;
        a = tmp;
        tmp = y;
        y = x;
        x = tmp;
        upper = !upper;
      }
      if (b === 1) {
        if (a === 1) {
          out[i0] = upper ? y : x;
          out[i1] = 1;
          return out;
        }
        out[i1] = a * pow(x, a - 1);
        if (y < 0.5) {
          p = upper ? -expm1(a * log1p(-y)) : exp(a * log1p(-y));
        } else {
          p = upper ? -(pow(x, a) - 1) : pow(x, a);
        }
        if (!regularized) {
          p /= a;
        }
        out[i0] = p;
        return out;
      }
      if (min(a, b) <= 1) {
        if (x > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
        }
        if (max(a, b) <= 1) {
          if (a >= min(0.2, b) || pow(x, a) <= 0.9) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else {
            tmp = b;
            b = a;
            a = tmp;
            tmp = y;
            y = x;
            x = tmp;
            upper = !upper;
            if (y >= 0.3) {
              if (upper) {
                fract = -(regularized ? 1 : beta(a, b));
                upper = false;
                fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
              } else {
                fract = ibetaSeries(a, b, x, 0, regularized, out, y);
              }
            } else {
              if (regularized) {
                prefix = 1;
              } else {
                prefix = risingFactorialRatio(a + b, a, 20);
              }
              fract = ibetaAStep(a, b, x, y, 20, regularized, out);
              if (upper) {
                fract -= regularized ? 1 : beta(a, b);
                upper = false;
                fract = -betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix, regularized);
              } else {
                fract = betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix, regularized);
              }
            }
          }
        } else if (b <= 1 || x < 0.1 && pow(b * x, a) <= 0.7) {
          if (upper) {
            fract = -(regularized ? 1 : beta(a, b));
            upper = false;
            fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
          } else {
            fract = ibetaSeries(a, b, x, 0, regularized, out, y);
          }
        } else {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
          if (y >= 0.3) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else if (a >= 15) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -betaSmallBLargeASeries(a, b, x, y, fract, 1, regularized);
            } else {
              fract = betaSmallBLargeASeries(a, b, x, y, 0, 1, regularized);
            }
          } else {
            if (regularized) {
              prefix = 1;
            } else {
              prefix = risingFactorialRatio(a + b, a, 20);
            }
            fract = ibetaAStep(a, b, x, y, 20, regularized, out);
            if (upper) {
              fract -= regularized ? 1 : beta(a, b);
              upper = false;
              fract = -betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix, regularized);
            } else {
              fract = betaSmallBLargeASeries(a + 20, b, x, y, fract, prefix, regularized);
            }
          }
        }
      } else {
        if (a < b) {
          lambda = a - (a + b) * x;
        } else {
          lambda = (a + b) * y - b;
        }
        if (lambda < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = y;
          y = x;
          x = tmp;
          upper = !upper;
        }
        if (b < 40) {
          if (floor(a) === a && floor(b) === b && a < MAX_INT32 - 100) {
            k = a - 1;
            n = b + k;
            fract = binomialCCDF(n, k, x, y);
            if (!regularized) {
              fract *= beta(a, b);
            }
          } else if (b * x <= 0.7) {
            if (upper) {
              fract = -(regularized ? 1 : beta(a, b));
              upper = false;
              fract = -ibetaSeries(a, b, x, fract, regularized, out, y);
            } else {
              fract = ibetaSeries(a, b, x, 0, regularized, out, y);
            }
          } else if (a > 15) {
            n = floor(b);
            if (n === b) {
              n -= 1;
            }
            bbar = b - n;
            if (regularized) {
              prefix = 1;
            } else {
              prefix = risingFactorialRatio(a + bbar, bbar, n);
            }
            fract = ibetaAStep(bbar, a, y, x, n, regularized);
            fract = betaSmallBLargeASeries(a, bbar, x, y, fract, 1, regularized);
            fract /= prefix;
          } else if (regularized) {
            n = floor(b);
            bbar = b - n;
            if (bbar <= 0) {
              n -= 1;
              bbar += 1;
            }
            fract = ibetaAStep(bbar, a, y, x, n, regularized);
            fract += ibetaAStep(a, bbar, x, y, 20, regularized);
            if (upper) {
              fract -= 1;
            }
            fract = betaSmallBLargeASeries(a + 20, bbar, x, y, fract, 1, regularized);
            if (upper) {
              fract = -fract;
              upper = false;
            }
          } else {
            fract = ibetaFraction2(a, b, x, y, regularized, out);
          }
        } else {
          fract = ibetaFraction2(a, b, x, y, regularized, out);
        }
      }
      if (out[i1] < 0) {
        out[i1] = ibetaPowerTerms(a, b, x, y, true);
      }
      div = y * x;
      if (out[i1] !== 0) {
        if (MAX_FLOAT64 * div < out[i1]) {
          out[i1] = MAX_FLOAT64 / 2;
        } else {
          out[i1] /= div;
        }
      }
      out[i0] = upper ? (regularized ? 1 : beta(a, b)) - fract : fract;
      return out;
    }
    module.exports = ibetaImp;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/main.js
var require_main89 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/main.js"(exports, module) {
    "use strict";
    var compute = require_assign3();
    function kernelBetainc(x, a, b, regularized, upper) {
      return compute(x, a, b, regularized, upper, [0, 0], 1, 0);
    }
    module.exports = kernelBetainc;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betainc/lib/index.js
var require_lib127 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betainc/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main89();
    var assign = require_assign3();
    setReadOnly(main2, "assign", assign);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-betainc/lib/main.js
var require_main90 = __commonJS({
  "node_modules/@stdlib/math-base-special-betainc/lib/main.js"(exports, module) {
    "use strict";
    var kernelBetainc = require_lib127().assign;
    function betainc(x, a, b, regularized, upper) {
      var out = [0, 0];
      regularized = regularized === false ? false : true;
      upper = upper === true ? true : false;
      kernelBetainc(x, a, b, regularized, upper, out, 1, 0);
      return out[0];
    }
    module.exports = betainc;
  }
});

// node_modules/@stdlib/math-base-special-betainc/lib/index.js
var require_lib128 = __commonJS({
  "node_modules/@stdlib/math-base-special-betainc/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main90();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/main.js
var require_main91 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/main.js"(exports, module) {
    "use strict";
    var betainc = require_lib128();
    var isnan = require_lib6();
    var pow = require_lib75();
    function cdf(x, v) {
      var x2;
      var p;
      var z;
      if (isnan(x) || isnan(v) || v <= 0) {
        return NaN;
      }
      if (x === 0) {
        return 0.5;
      }
      x2 = pow(x, 2);
      if (v > 2 * x2) {
        z = x2 / (v + x2);
        p = betainc(z, 0.5, v / 2, true, true) / 2;
      } else {
        z = v / (v + x2);
        p = betainc(z, v / 2, 0.5, true, false) / 2;
      }
      return x > 0 ? 1 - p : p;
    }
    module.exports = cdf;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/factory.js
var require_factory6 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var betainc = require_lib128();
    var isnan = require_lib6();
    var pow = require_lib75();
    function factory(v) {
      if (isnan(v) || v <= 0) {
        return constantFunction(NaN);
      }
      return cdf;
      function cdf(x) {
        var x2;
        var p;
        var z;
        if (isnan(x)) {
          return NaN;
        }
        if (x === 0) {
          return 0.5;
        }
        x2 = pow(x, 2);
        if (v > 2 * x2) {
          z = x2 / (v + x2);
          p = betainc(z, 0.5, v / 2, true, true) / 2;
        } else {
          z = v / (v + x2);
          p = betainc(z, v / 2, 0.5, true, false) / 2;
        }
        return x > 0 ? 1 - p : p;
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-t-cdf/lib/index.js
var require_lib129 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-cdf/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main91();
    var factory = require_factory6();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p1q1.js
var require_rational_p1q13 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p1q1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -5087819496582806e-19;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -5087819496582806e-19 + x * (-0.008368748197417368 + x * (0.03348066254097446 + x * (-0.012692614766297404 + x * (-0.03656379714117627 + x * (0.02198786811111689 + x * (0.008226878746769157 + x * (-0.005387729650712429 + x * (0 + x * 0))))))));
        s2 = 1 + x * (-0.9700050433032906 + x * (-1.5657455823417585 + x * (1.5622155839842302 + x * (0.662328840472003 + x * (-0.7122890234154284 + x * (-0.05273963823400997 + x * (0.07952836873415717 + x * (-0.0023339375937419 + x * 8862163904564247e-19))))))));
      } else {
        x = 1 / x;
        s1 = 0 + x * (0 + x * (-0.005387729650712429 + x * (0.008226878746769157 + x * (0.02198786811111689 + x * (-0.03656379714117627 + x * (-0.012692614766297404 + x * (0.03348066254097446 + x * (-0.008368748197417368 + x * -5087819496582806e-19))))))));
        s2 = 8862163904564247e-19 + x * (-0.0023339375937419 + x * (0.07952836873415717 + x * (-0.05273963823400997 + x * (-0.7122890234154284 + x * (0.662328840472003 + x * (1.5622155839842302 + x * (-1.5657455823417585 + x * (-0.9700050433032906 + x * 1))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p2q2.js
var require_rational_p2q23 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p2q2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.20243350835593876;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.20243350835593876 + x * (0.10526468069939171 + x * (8.3705032834312 + x * (17.644729840837403 + x * (-18.851064805871424 + x * (-44.6382324441787 + x * (17.445385985570866 + x * (21.12946554483405 + x * -3.6719225470772936)))))));
        s2 = 1 + x * (6.242641248542475 + x * (3.971343795334387 + x * (-28.66081804998 + x * (-20.14326346804852 + x * (48.560921310873994 + x * (10.826866735546016 + x * (-22.643693341313973 + x * 1.7211476576120028)))))));
      } else {
        x = 1 / x;
        s1 = -3.6719225470772936 + x * (21.12946554483405 + x * (17.445385985570866 + x * (-44.6382324441787 + x * (-18.851064805871424 + x * (17.644729840837403 + x * (8.3705032834312 + x * (0.10526468069939171 + x * -0.20243350835593876)))))));
        s2 = 1.7211476576120028 + x * (-22.643693341313973 + x * (10.826866735546016 + x * (48.560921310873994 + x * (-20.14326346804852 + x * (-28.66081804998 + x * (3.971343795334387 + x * (6.242641248542475 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p3q3.js
var require_rational_p3q33 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p3q3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.1311027816799519;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.1311027816799519 + x * (-0.16379404719331705 + x * (0.11703015634199525 + x * (0.38707973897260434 + x * (0.3377855389120359 + x * (0.14286953440815717 + x * (0.029015791000532906 + x * (0.0021455899538880526 + x * (-6794655751811263e-22 + x * (28522533178221704e-24 + x * -681149956853777e-24)))))))));
        s2 = 1 + x * (3.4662540724256723 + x * (5.381683457070069 + x * (4.778465929458438 + x * (2.5930192162362027 + x * (0.848854343457902 + x * (0.15226433829533179 + x * (0.011059242293464892 + x * (0 + x * (0 + x * 0)))))))));
      } else {
        x = 1 / x;
        s1 = -681149956853777e-24 + x * (28522533178221704e-24 + x * (-6794655751811263e-22 + x * (0.0021455899538880526 + x * (0.029015791000532906 + x * (0.14286953440815717 + x * (0.3377855389120359 + x * (0.38707973897260434 + x * (0.11703015634199525 + x * (-0.16379404719331705 + x * -0.1311027816799519)))))))));
        s2 = 0 + x * (0 + x * (0 + x * (0.011059242293464892 + x * (0.15226433829533179 + x * (0.848854343457902 + x * (2.5930192162362027 + x * (4.778465929458438 + x * (5.381683457070069 + x * (3.4662540724256723 + x * 1)))))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p4q4.js
var require_rational_p4q42 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p4q4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0350353787183178;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0350353787183178 + x * (-0.0022242652921344794 + x * (0.018557330651423107 + x * (0.009508047013259196 + x * (0.0018712349281955923 + x * (15754461742496055e-20 + x * (460469890584318e-20 + x * (-2304047769118826e-25 + x * 26633922742578204e-28)))))));
        s2 = 1 + x * (1.3653349817554064 + x * (0.7620591645536234 + x * (0.22009110576413124 + x * (0.03415891436709477 + x * (0.00263861676657016 + x * (7646752923027944e-20 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 26633922742578204e-28 + x * (-2304047769118826e-25 + x * (460469890584318e-20 + x * (15754461742496055e-20 + x * (0.0018712349281955923 + x * (0.009508047013259196 + x * (0.018557330651423107 + x * (-0.0022242652921344794 + x * -0.0350353787183178)))))));
        s2 = 0 + x * (0 + x * (7646752923027944e-20 + x * (0.00263861676657016 + x * (0.03415891436709477 + x * (0.22009110576413124 + x * (0.7620591645536234 + x * (1.3653349817554064 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p5q5.js
var require_rational_p5q52 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/rational_p5q5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.016743100507663373;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.016743100507663373 + x * (-0.0011295143874558028 + x * (0.001056288621524929 + x * (20938631748758808e-20 + x * (14962478375834237e-21 + x * (44969678992770644e-23 + x * (4625961635228786e-24 + x * (-2811287356288318e-29 + x * 9905570997331033e-32)))))));
        s2 = 1 + x * (0.5914293448864175 + x * (0.1381518657490833 + x * (0.016074608709367652 + x * (9640118070051656e-19 + x * (27533547476472603e-21 + x * (282243172016108e-21 + x * (0 + x * 0)))))));
      } else {
        x = 1 / x;
        s1 = 9905570997331033e-32 + x * (-2811287356288318e-29 + x * (4625961635228786e-24 + x * (44969678992770644e-23 + x * (14962478375834237e-21 + x * (20938631748758808e-20 + x * (0.001056288621524929 + x * (-0.0011295143874558028 + x * -0.016743100507663373)))))));
        s2 = 0 + x * (0 + x * (282243172016108e-21 + x * (27533547476472603e-21 + x * (9640118070051656e-19 + x * (0.016074608709367652 + x * (0.1381518657490833 + x * (0.5914293448864175 + x * 1)))))));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/main.js
var require_main92 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var sqrt = require_lib54();
    var ln = require_lib59();
    var PINF = require_lib12();
    var NINF = require_lib11();
    var rationalFcnR1 = require_rational_p1q13();
    var rationalFcnR2 = require_rational_p2q23();
    var rationalFcnR3 = require_rational_p3q33();
    var rationalFcnR4 = require_rational_p4q42();
    var rationalFcnR5 = require_rational_p5q52();
    var Y1 = 0.08913147449493408;
    var Y2 = 2.249481201171875;
    var Y3 = 0.807220458984375;
    var Y4 = 0.9399557113647461;
    var Y5 = 0.9836282730102539;
    function erfcinv(x) {
      var sign;
      var qs;
      var q;
      var g;
      var r;
      if (isnan(x)) {
        return NaN;
      }
      if (x === 0) {
        return PINF;
      }
      if (x === 2) {
        return NINF;
      }
      if (x === 1) {
        return 0;
      }
      if (x > 2 || x < 0) {
        return NaN;
      }
      if (x > 1) {
        sign = -1;
        q = 2 - x;
      } else {
        sign = 1;
        q = x;
      }
      x = 1 - q;
      if (x <= 0.5) {
        g = x * (x + 10);
        r = rationalFcnR1(x);
        return sign * (g * Y1 + g * r);
      }
      if (q >= 0.25) {
        g = sqrt(-2 * ln(q));
        q -= 0.25;
        r = rationalFcnR2(q);
        return sign * (g / (Y2 + r));
      }
      q = sqrt(-ln(q));
      if (q < 3) {
        qs = q - 1.125;
        r = rationalFcnR3(qs);
        return sign * (Y3 * q + r * q);
      }
      if (q < 6) {
        qs = q - 3;
        r = rationalFcnR4(qs);
        return sign * (Y4 * q + r * q);
      }
      qs = q - 6;
      r = rationalFcnR5(qs);
      return sign * (Y5 * q + r * q);
    }
    module.exports = erfcinv;
  }
});

// node_modules/@stdlib/math-base-special-erfcinv/lib/index.js
var require_lib130 = __commonJS({
  "node_modules/@stdlib/math-base-special-erfcinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main92();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-acos/lib/main.js
var require_main93 = __commonJS({
  "node_modules/@stdlib/math-base-special-acos/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var asin = require_lib67();
    var sqrt = require_lib54();
    var PIO4 = require_lib66();
    var MOREBITS = 6123233995736766e-32;
    function acos(x) {
      var z;
      if (isnan(x)) {
        return NaN;
      }
      if (x < -1 || x > 1) {
        return NaN;
      }
      if (x > 0.5) {
        return 2 * asin(sqrt(0.5 - 0.5 * x));
      }
      z = PIO4 - asin(x);
      z += MOREBITS;
      z += PIO4;
      return z;
    }
    module.exports = acos;
  }
});

// node_modules/@stdlib/math-base-special-acos/lib/index.js
var require_lib131 = __commonJS({
  "node_modules/@stdlib/math-base-special-acos/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main93();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-sqrt-two/lib/index.js
var require_lib132 = __commonJS({
  "node_modules/@stdlib/constants-float64-sqrt-two/lib/index.js"(exports, module) {
    "use strict";
    var SQRT2 = 1.4142135623730951;
    module.exports = SQRT2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co14.js
var require_polyval_co14 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co14.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.16666666666666666;
      }
      return 0.16666666666666666 + x * 0.16666666666666666;
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co15.js
var require_polyval_co15 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co15.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.058333333333333334;
      }
      return 0.058333333333333334 + x * (0.06666666666666667 + x * 0.008333333333333333);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co16.js
var require_polyval_co16 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co16.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0251984126984127;
      }
      return 0.0251984126984127 + x * (0.026785714285714284 + x * (0.0017857142857142857 + x * 1984126984126984e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co17.js
var require_polyval_co17 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co17.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.012039792768959435;
      }
      return 0.012039792768959435 + x * (0.010559964726631394 + x * (-0.0011078042328042327 + x * (3747795414462081e-19 + x * 27557319223985893e-22)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co18.js
var require_polyval_co18 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co18.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.003837005972422639;
      }
      return 0.003837005972422639 + x * (0.00610392115600449 + x * (-0.0016095979637646305 + x * (5945867404200738e-19 + x * (-6270542728876062e-20 + x * 2505210838544172e-23))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co19.js
var require_polyval_co19 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co19.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.0032177478835464946;
      }
      return 0.0032177478835464946 + x * (0.0010898206731540065 + x * (-0.0012579159844784845 + x * (6908420797309686e-19 + x * (-16376804137220805e-20 + x * (154012654012654e-19 + x * 16059043836821613e-26)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co20.js
var require_polyval_co20 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co20.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.001743826229834001;
      }
      return 0.001743826229834001 + x * (3353097688001788e-20 + x * (-7624513544032393e-19 + x * (6451304695145635e-19 + x * (-249472580470431e-18 + x * (49255746366361444e-21 + x * (-39851014346715405e-22 + x * 7647163731819816e-28))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co21.js
var require_polyval_co21 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co21.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 9647274732138864e-19;
      }
      return 9647274732138864e-19 + x * (-3110108632631878e-19 + x * (-36307660358786886e-20 + x * (5140660578834113e-19 + x * (-29133414466938067e-20 + x * (9086710793521991e-20 + x * (-15303004486655377e-21 + x * (10914179173496788e-22 + x * 28114572543455206e-31)))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co22.js
var require_polyval_co22 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co22.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 5422926281312969e-19;
      }
      return 5422926281312969e-19 + x * (-3694266780000966e-19 + x * (-10230378073700413e-20 + x * (35764655430568635e-20 + x * (-28690924218514614e-20 + x * (12645437628698076e-20 + x * (-33202652391372056e-21 + x * (4890304529197534e-21 + x * (-3123956959982987e-22 + x * 822063524662433e-32))))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_body_series.js
var require_inverse_students_t_body_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_body_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var evalpoly = require_lib113();
    var sqrt = require_lib54();
    var PI = require_lib86();
    var polyval1 = require_polyval_co14();
    var polyval2 = require_polyval_co15();
    var polyval3 = require_polyval_co16();
    var polyval4 = require_polyval_co17();
    var polyval5 = require_polyval_co18();
    var polyval6 = require_polyval_co19();
    var polyval7 = require_polyval_co20();
    var polyval8 = require_polyval_co21();
    var polyval9 = require_polyval_co22();
    var c0 = 0;
    var c = [1, 0, 0, 0, 0, 0, 0, 0, 0, 0];
    function inverseStudentsTBodySeries(df, u) {
      var idf;
      var v;
      v = gammaDeltaRatio(df / 2, 0.5) * sqrt(df * PI) * (u - 0.5);
      idf = 1 / df;
      c[1] = polyval1(idf);
      c[2] = polyval2(idf);
      c[3] = polyval3(idf);
      c[4] = polyval4(idf);
      c[5] = polyval5(idf);
      c[6] = polyval6(idf);
      c[7] = polyval7(idf);
      c[8] = polyval8(idf);
      c[9] = polyval9(idf);
      return c0 + v * evalpoly(c, v * v);
    }
    module.exports = inverseStudentsTBodySeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_tail_series.js
var require_inverse_students_t_tail_series = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_tail_series.js"(exports, module) {
    "use strict";
    var gammaDeltaRatio = require_lib102();
    var evalpoly = require_lib113();
    var sqrt = require_lib54();
    var pow = require_lib75();
    var PI = require_lib86();
    var d = [0, 0, 0, 0, 0, 0, 0];
    function inverseStudentsTTailSeries(df, v) {
      var result;
      var power;
      var div;
      var np2;
      var np4;
      var np6;
      var rn;
      var w;
      w = gammaDeltaRatio(df / 2, 0.5) * sqrt(df * PI) * v;
      np2 = df + 2;
      np4 = df + 4;
      np6 = df + 6;
      d[0] = 1;
      d[1] = -(df + 1) / (2 * np2);
      np2 *= df + 2;
      d[2] = -df * (df + 1) * (df + 3) / (8 * np2 * np4);
      np2 *= df + 2;
      d[3] = -df * (df + 1) * (df + 5) * ((3 * df + 7) * df - 2) / (48 * np2 * np4 * np6);
      np2 *= df + 2;
      np4 *= df + 4;
      d[4] = -df * (df + 1) * (df + 7) * (((((15 * df + 154) * df + 465) * df + 286) * df - 336) * df + 64) / (384 * np2 * np4 * np6 * (df + 8));
      np2 *= df + 2;
      d[5] = -df * (df + 1) * (df + 3) * (df + 9) * ((((((35 * df + 452) * df + 1573) * df + 600) * df - 2020) * df + 928) * df - 128) / (1280 * np2 * np4 * np6 * (df + 8) * (df + 10));
      np2 *= df + 2;
      np4 *= df + 4;
      np6 *= df + 6;
      d[6] = -df * (df + 1) * (df + 11) * (((((((((((945 * df + 31506) * df + 425858) * df + 2980236) * df + 11266745) * df + 20675018) * df + 7747124) * df - 22574632) * df - 8565600) * df + 18108416) * df - 7099392) * df + 884736) / (46080 * np2 * np4 * np6 * (df + 8) * (df + 10) * (df + 12));
      rn = sqrt(df);
      div = pow(rn * w, 1 / df);
      power = div * div;
      result = evalpoly(d, power);
      result *= rn;
      result /= div;
      return -result;
    }
    module.exports = inverseStudentsTTailSeries;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_hill.js
var require_inverse_students_t_hill = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t_hill.js"(exports, module) {
    "use strict";
    var erfcinv = require_lib130();
    var expm1 = require_lib64();
    var sqrt = require_lib54();
    var pow = require_lib75();
    var HALF_PI = require_lib85();
    var SQRT2 = require_lib132();
    function inverseStudentsTHill(ndf, u) {
      var a;
      var b;
      var c;
      var d;
      var q;
      var x;
      var y;
      if (ndf > 1e20) {
        return -erfcinv(2 * u) * SQRT2;
      }
      a = 1 / (ndf - 0.5);
      b = 48 / (a * a);
      c = ((20700 * a / b - 98) * a - 16) * a + 96.36;
      d = ((94.5 / (b + c) - 3) / b + 1) * sqrt(a * HALF_PI) * ndf;
      y = pow(d * 2 * u, 2 / ndf);
      if (y > 0.05 + a) {
        x = -erfcinv(2 * u) * SQRT2;
        y = x * x;
        if (ndf < 5) {
          c += 0.3 * (ndf - 4.5) * (x + 0.6);
        }
        c += (((0.05 * d * x - 5) * x - 7) * x - 2) * x + b;
        y = (((((0.4 * y + 6.3) * y + 36) * y + 94.5) / c - y - 3) / b + 1) * x;
        y = expm1(a * y * y);
      } else {
        y = ((1 / (((ndf + 6) / (ndf * y) - 0.089 * d - 0.822) * (ndf + 2) * 3) + 0.5 / (ndf + 4)) * y - 1) * (ndf + 1) / (ndf + 2) + 1 / y;
      }
      q = sqrt(ndf * y);
      return -q;
    }
    module.exports = inverseStudentsTHill;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t.js
var require_inverse_students_t = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/inverse_students_t.js"(exports, module) {
    "use strict";
    var erfcinv = require_lib130();
    var floor = require_lib7();
    var ldexp = require_lib50();
    var round = require_lib92();
    var acos = require_lib131();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var cos = require_lib103();
    var pow = require_lib75();
    var sin = require_lib94();
    var SQRT2 = require_lib132();
    var PI = require_lib86();
    var inverseStudentsTBodySeries = require_inverse_students_t_body_series();
    var inverseStudentsTTailSeries = require_inverse_students_t_tail_series();
    var inverseStudentsTHill = require_inverse_students_t_hill();
    var DF_THRESHOLD = 268435456;
    var ONE_THIRD = 1 / 3;
    var EXP = 2 * 53 / 3;
    var C = 0.8549879733383485;
    function inverseStudentsT(df, u, v) {
      var crossover;
      var tolerance;
      var rootAlpha;
      var invert;
      var result;
      var alpha;
      var tmp;
      var p0;
      var p2;
      var p4;
      var p5;
      var p;
      var r;
      var x;
      var a;
      var b;
      result = 0;
      if (u > v) {
        tmp = v;
        v = u;
        u = tmp;
        invert = true;
      } else {
        invert = false;
      }
      if (floor(df) === df && df < 20) {
        tolerance = ldexp(1, EXP);
        switch (floor(df)) {
          case 1:
            if (u === 0.5) {
              result = 0;
            } else {
              result = -cos(PI * u) / sin(PI * u);
            }
            break;
          case 2:
            result = (2 * u - 1) / sqrt(2 * u * v);
            break;
          case 4:
            alpha = 4 * u * v;
            rootAlpha = sqrt(alpha);
            r = 4 * cos(acos(rootAlpha) / 3) / rootAlpha;
            x = sqrt(r - 4);
            result = u - 0.5 < 0 ? -x : x;
            break;
          case 6:
            if (u < 1e-150) {
              return (invert ? -1 : 1) * inverseStudentsTHill(df, u);
            }
            a = 4 * (u - u * u);
            b = pow(a, ONE_THIRD);
            p = 6 * (1 + C * (1 / b - 1));
            do {
              p2 = p * p;
              p4 = p2 * p2;
              p5 = p * p4;
              p0 = p;
              p = 2 * (8 * a * p5 - 270 * p2 + 2187) / (5 * (4 * a * p4 - 216 * p - 243));
            } while (abs((p - p0) / p) > tolerance);
            p = sqrt(p - df);
            result = u - 0.5 < 0 ? -p : p;
            break;
          default:
            if (df > DF_THRESHOLD) {
              result = erfcinv(2 * u) * SQRT2;
            } else if (df < 3) {
              crossover = 0.2742 - df * 0.0242143;
              if (u > crossover) {
                result = inverseStudentsTBodySeries(df, u);
              } else {
                result = inverseStudentsTTailSeries(df, u);
              }
            } else {
              crossover = ldexp(1, round(df / -0.654));
              if (u > crossover) {
                result = inverseStudentsTHill(df, u);
              } else {
                result = inverseStudentsTTailSeries(df, u);
              }
            }
        }
      } else if (df > DF_THRESHOLD) {
        result = -erfcinv(2 * u) * SQRT2;
      } else if (df < 3) {
        crossover = 0.2742 - df * 0.0242143;
        if (u > crossover) {
          result = inverseStudentsTBodySeries(df, u);
        } else {
          result = inverseStudentsTTailSeries(df, u);
        }
      } else {
        crossover = ldexp(1, round(df / -0.654));
        if (u > crossover) {
          result = inverseStudentsTHill(df, u);
        } else {
          result = inverseStudentsTTailSeries(df, u);
        }
      }
      return invert ? -result : result;
    }
    module.exports = inverseStudentsT;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/find_ibeta_inv_from_t_dist.js
var require_find_ibeta_inv_from_t_dist = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/find_ibeta_inv_from_t_dist.js"(exports, module) {
    "use strict";
    var inverseStudentsT = require_inverse_students_t();
    function findIBetaInvFromTDist(a, p, py) {
      var df;
      var u;
      var v;
      var t;
      u = p / 2;
      v = 1 - u;
      df = a * 2;
      t = inverseStudentsT(df, u, v);
      if (py) {
        py.value = t * t / (df + t * t);
      }
      return df / (df + t * t);
    }
    module.exports = findIBetaInvFromTDist;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme1.js
var require_temme1 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme1.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var erfcinv = require_lib130();
    var sqrt = require_lib54();
    var exp = require_lib51();
    var SQRT2 = require_lib132();
    var workspace = [0, 0, 0, 0, 0, 0, 0];
    var terms = [0, 0, 0, 0];
    function temme1(a, b, z) {
      var eta0;
      var eta2;
      var eta;
      var B2;
      var B3;
      var B;
      var c;
      eta0 = erfcinv(2 * z);
      eta0 /= -sqrt(a / 2);
      terms[0] = eta0;
      B = b - a;
      B2 = B * B;
      B3 = B2 * B;
      workspace[0] = -B * SQRT2 / 2;
      workspace[1] = (1 - 2 * B) / 8;
      workspace[2] = -(B * SQRT2 / 48);
      workspace[3] = -1 / 192;
      workspace[4] = -B * SQRT2 / 3840;
      workspace[5] = 0;
      workspace[6] = 0;
      terms[1] = evalpoly(workspace, eta0);
      workspace[0] = B * SQRT2 * (3 * B - 2) / 12;
      workspace[1] = (20 * B2 - 12 * B + 1) / 128;
      workspace[2] = B * SQRT2 * (20 * B - 1) / 960;
      workspace[3] = (16 * B2 + 30 * B - 15) / 4608;
      workspace[4] = B * SQRT2 * (21 * B + 32) / 53760;
      workspace[5] = (-(32 * B2) + 63) / 368640;
      workspace[6] = -B * SQRT2 * (120 * B + 17) / 25804480;
      terms[2] = evalpoly(workspace, eta0);
      workspace[0] = B * SQRT2 * (-75 * B2 + 80 * B - 16) / 480;
      workspace[1] = (-1080 * B3 + 868 * B2 - 90 * B - 45) / 9216;
      workspace[2] = B * SQRT2 * (-1190 * B2 + 84 * B + 373) / 53760;
      workspace[3] = (-2240 * B3 - 2508 * B2 + 2100 * B - 165) / 368640;
      workspace[4] = 0;
      workspace[5] = 0;
      workspace[6] = 0;
      terms[3] = evalpoly(workspace, eta0);
      eta = evalpoly(terms, 1 / a);
      eta2 = eta * eta;
      c = -exp(-eta2 / 2);
      if (eta2 === 0) {
        return 0.5;
      }
      return (1 + eta * sqrt((1 + c) / eta2)) / 2;
    }
    module.exports = temme1;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/root_finder.js
var require_root_finder = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/root_finder.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var MAX_VALUE = require_lib83();
    var BIG = MAX_VALUE / 4;
    function temmeRootFinder(t, a) {
      return roots;
      function roots(x) {
        var f1;
        var f;
        var y;
        y = 1 - x;
        if (y === 0) {
          return [-BIG, -BIG];
        }
        if (x === 0) {
          return [-BIG, -BIG];
        }
        f = ln(x) + a * ln(y) + t;
        f1 = 1 / x - a / y;
        return [f, f1];
      }
    }
    module.exports = temmeRootFinder;
  }
});

// node_modules/@stdlib/math-base-special-signum/lib/main.js
var require_main94 = __commonJS({
  "node_modules/@stdlib/math-base-special-signum/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    function signum(x) {
      if (x === 0 || isnan(x)) {
        return x;
      }
      return x < 0 ? -1 : 1;
    }
    module.exports = signum;
  }
});

// node_modules/@stdlib/math-base-special-signum/lib/index.js
var require_lib133 = __commonJS({
  "node_modules/@stdlib/math-base-special-signum/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main94();
    module.exports = main2;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/newton_raphson.js
var require_newton_raphson = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/newton_raphson.js"(exports, module) {
    "use strict";
    var sign = require_lib133();
    var abs = require_lib46();
    var ldexp = require_lib50();
    var MAX_VALUE = require_lib83();
    function newtonRaphsonIterate(fun, guess, min, max, digits, maxIter) {
      var f0last;
      var delta1;
      var delta2;
      var factor;
      var result;
      var count;
      var delta;
      var res;
      var f0;
      var f1;
      f0 = 0;
      f0last = 0;
      result = guess;
      factor = ldexp(1, 1 - digits);
      delta = MAX_VALUE;
      delta1 = MAX_VALUE;
      delta2 = MAX_VALUE;
      count = maxIter;
      do {
        f0last = f0;
        delta2 = delta1;
        delta1 = delta;
        res = fun(result);
        f0 = res[0];
        f1 = res[1];
        count -= 1;
        if (f0 === 0) {
          break;
        }
        if (f1 === 0) {
          if (f0last === 0) {
            if (result === min) {
              guess = max;
            } else {
              guess = min;
            }
            f0last = fun(guess);
            delta = guess - result;
          }
          if (sign(f0last) * sign(f0) < 0) {
            if (delta < 0) {
              delta = (result - min) / 2;
            } else {
              delta = (result - max) / 2;
            }
          } else if (delta < 0) {
            delta = (result - max) / 2;
          } else {
            delta = (result - min) / 2;
          }
        } else {
          delta = f0 / f1;
        }
        if (abs(delta * 2) > abs(delta2)) {
          delta = delta > 0 ? (result - min) / 2 : (result - max) / 2;
        }
        guess = result;
        result -= delta;
        if (result <= min) {
          delta = 0.5 * (guess - min);
          result = guess - delta;
          if (result === min || result === max) {
            break;
          }
        } else if (result >= max) {
          delta = 0.5 * (guess - max);
          result = guess - delta;
          if (result === min || result === max) {
            break;
          }
        }
        if (delta > 0) {
          max = guess;
        } else {
          min = guess;
        }
      } while (count && abs(result * factor) < abs(delta));
      return result;
    }
    module.exports = newtonRaphsonIterate;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co1.js
var require_polyval_co1 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -1;
      }
      return -1 + x * (-5 + x * 5);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co2.js
var require_polyval_co2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (21 + x * (-69 + x * 46));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co3.js
var require_polyval_co3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co3.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 7;
      }
      return 7 + x * (-2 + x * (33 + x * (-62 + x * 31)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co4.js
var require_polyval_co4 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co4.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 25;
      }
      return 25 + x * (-52 + x * (-17 + x * (88 + x * (-115 + x * 46))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co5.js
var require_polyval_co5 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co5.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 7;
      }
      return 7 + x * (12 + x * (-78 + x * 52));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co6.js
var require_polyval_co6 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co6.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -7;
      }
      return -7 + x * (2 + x * (183 + x * (-370 + x * 185)));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co7.js
var require_polyval_co7 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co7.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -533;
      }
      return -533 + x * (776 + x * (-1835 + x * (10240 + x * (-13525 + x * 5410))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co8.js
var require_polyval_co8 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co8.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return -1579;
      }
      return -1579 + x * (3747 + x * (-3372 + x * (-15821 + x * (45588 + x * (-45213 + x * 15071)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co9.js
var require_polyval_co9 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co9.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 449;
      }
      return 449 + x * (-1259 + x * (-769 + x * (6686 + x * (-9260 + x * 3704))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co10.js
var require_polyval_co10 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co10.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 63149;
      }
      return 63149 + x * (-151557 + x * (140052 + x * (-727469 + x * (2239932 + x * (-2251437 + x * 750479)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co11.js
var require_polyval_co11 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co11.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 29233;
      }
      return 29233 + x * (-78755 + x * (105222 + x * (146879 + x * (-1602610 + x * (3195183 + x * (-2554139 + x * 729754))))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co12.js
var require_polyval_co12 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co12.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (-13 + x * 13);
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co13.js
var require_polyval_co13 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/polyval_co13.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (21 + x * (-69 + x * 46));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme2.js
var require_temme2 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme2.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var erfcinv = require_lib130();
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var sqrt = require_lib54();
    var sin = require_lib94();
    var cos = require_lib103();
    var temmeRootFinder = require_root_finder();
    var newtonRaphsonIterate = require_newton_raphson();
    var polyval1 = require_polyval_co1();
    var polyval2 = require_polyval_co2();
    var polyval3 = require_polyval_co3();
    var polyval4 = require_polyval_co4();
    var polyval5 = require_polyval_co5();
    var polyval6 = require_polyval_co6();
    var polyval7 = require_polyval_co7();
    var polyval8 = require_polyval_co8();
    var polyval9 = require_polyval_co9();
    var polyval10 = require_polyval_co10();
    var polyval11 = require_polyval_co11();
    var polyval12 = require_polyval_co12();
    var polyval13 = require_polyval_co13();
    var workspace = [0, 0, 0, 0, 0, 0];
    var terms = [0, 0, 0, 0];
    function temme2(z, r, theta) {
      var upper;
      var lower;
      var alpha;
      var roots;
      var eta0;
      var eta;
      var sc7;
      var sc6;
      var sc5;
      var sc4;
      var sc3;
      var sc2;
      var sc;
      var lu;
      var s2;
      var c2;
      var c;
      var s;
      var u;
      var x;
      eta0 = erfcinv(2 * z) / -sqrt(r / 2);
      s = sin(theta);
      c = cos(theta);
      terms[0] = eta0;
      s2 = s * s;
      c2 = c * c;
      sc = s * c;
      sc2 = sc * sc;
      sc3 = sc2 * sc;
      sc4 = sc2 * sc2;
      sc5 = sc2 * sc3;
      sc6 = sc3 * sc3;
      sc7 = sc4 * sc3;
      workspace[0] = (2 * s2 - 1) / (3 * sc);
      workspace[1] = -polyval1(s2) / (36 * sc2);
      workspace[2] = polyval2(s2) / (1620 * sc3);
      workspace[3] = polyval3(s2) / (6480 * sc4);
      workspace[4] = polyval4(s2) / (90720 * sc5);
      workspace[5] = 0;
      terms[1] = evalpoly(workspace, eta0);
      workspace[0] = -polyval5(s2) / (405 * sc3);
      workspace[1] = polyval6(s2) / (2592 * sc4);
      workspace[2] = -polyval7(s2) / (204120 * sc5);
      workspace[3] = -polyval8(s2) / (2099520 * sc6);
      workspace[4] = 0;
      workspace[5] = 0;
      terms[2] = evalpoly(workspace, eta0);
      workspace[0] = polyval9(s2) / (102060 * sc5);
      workspace[1] = -polyval10(s2) / (20995200 * sc6);
      workspace[2] = polyval11(s2) / (36741600 * sc7);
      workspace[3] = 0;
      workspace[4] = 0;
      workspace[5] = 0;
      terms[3] = evalpoly(workspace, eta0);
      eta = evalpoly(terms, 1 / r);
      alpha = c / s;
      alpha *= alpha;
      lu = -(eta * eta) / (2 * s2) + ln(s2) + c2 * ln(c2) / s2;
      if (abs(eta) < 0.7) {
        workspace[0] = s2;
        workspace[1] = sc;
        workspace[2] = (1 - 2 * s2) / 3;
        workspace[3] = polyval12(s2) / (36 * sc);
        workspace[4] = polyval13(s2) / (270 * sc2);
        workspace[5] = 0;
        x = evalpoly(workspace, eta);
      } else {
        u = exp(lu);
        workspace[0] = u;
        workspace[1] = alpha;
        workspace[2] = 0;
        workspace[3] = 3 * alpha * (3 * alpha + 1) / 6;
        workspace[4] = 4 * alpha * (4 * alpha + 1) * (4 * alpha + 2) / 24;
        workspace[5] = 5 * alpha * (5 * alpha + 1) * (5 * alpha + 2) * (5 * alpha + 3) / 120;
        x = evalpoly(workspace, u);
        if ((x - s2) * eta < 0) {
          x = 1 - x;
        }
      }
      if (eta < 0) {
        lower = 0;
        upper = s2;
      } else {
        lower = s2;
        upper = 1;
      }
      if (x < lower || x > upper) {
        x = (lower + upper) / 2;
      }
      roots = temmeRootFinder(-lu, alpha);
      x = newtonRaphsonIterate(roots, x, lower, upper, 32, 100);
      return x;
    }
    module.exports = temme2;
  }
});

// node_modules/ms/index.js
var require_ms = __commonJS({
  "node_modules/ms/index.js"(exports, module) {
    var s = 1e3;
    var m = s * 60;
    var h = m * 60;
    var d = h * 24;
    var y = d * 365.25;
    module.exports = function(val, options) {
      options = options || {};
      var type = typeof val;
      if (type === "string" && val.length > 0) {
        return parse(val);
      } else if (type === "number" && isNaN(val) === false) {
        return options.long ? fmtLong(val) : fmtShort(val);
      }
      throw new Error(
        "val is not a non-empty string or a valid number. val=" + JSON.stringify(val)
      );
    };
    function parse(str) {
      str = String(str);
      if (str.length > 100) {
        return;
      }
      var match = /^((?:\d+)?\.?\d+) *(milliseconds?|msecs?|ms|seconds?|secs?|s|minutes?|mins?|m|hours?|hrs?|h|days?|d|years?|yrs?|y)?$/i.exec(
        str
      );
      if (!match) {
        return;
      }
      var n = parseFloat(match[1]);
      var type = (match[2] || "ms").toLowerCase();
      switch (type) {
        case "years":
        case "year":
        case "yrs":
        case "yr":
        case "y":
          return n * y;
        case "days":
        case "day":
        case "d":
          return n * d;
        case "hours":
        case "hour":
        case "hrs":
        case "hr":
        case "h":
          return n * h;
        case "minutes":
        case "minute":
        case "mins":
        case "min":
        case "m":
          return n * m;
        case "seconds":
        case "second":
        case "secs":
        case "sec":
        case "s":
          return n * s;
        case "milliseconds":
        case "millisecond":
        case "msecs":
        case "msec":
        case "ms":
          return n;
        default:
          return void 0;
      }
    }
    function fmtShort(ms) {
      if (ms >= d) {
        return Math.round(ms / d) + "d";
      }
      if (ms >= h) {
        return Math.round(ms / h) + "h";
      }
      if (ms >= m) {
        return Math.round(ms / m) + "m";
      }
      if (ms >= s) {
        return Math.round(ms / s) + "s";
      }
      return ms + "ms";
    }
    function fmtLong(ms) {
      return plural2(ms, d, "day") || plural2(ms, h, "hour") || plural2(ms, m, "minute") || plural2(ms, s, "second") || ms + " ms";
    }
    function plural2(ms, n, name) {
      if (ms < n) {
        return;
      }
      if (ms < n * 1.5) {
        return Math.floor(ms / n) + " " + name;
      }
      return Math.ceil(ms / n) + " " + name + "s";
    }
  }
});

// node_modules/debug/src/debug.js
var require_debug = __commonJS({
  "node_modules/debug/src/debug.js"(exports, module) {
    exports = module.exports = createDebug.debug = createDebug["default"] = createDebug;
    exports.coerce = coerce;
    exports.disable = disable;
    exports.enable = enable;
    exports.enabled = enabled;
    exports.humanize = require_ms();
    exports.names = [];
    exports.skips = [];
    exports.formatters = {};
    var prevTime;
    function selectColor(namespace) {
      var hash = 0, i;
      for (i in namespace) {
        hash = (hash << 5) - hash + namespace.charCodeAt(i);
        hash |= 0;
      }
      return exports.colors[Math.abs(hash) % exports.colors.length];
    }
    function createDebug(namespace) {
      function debug() {
        if (!debug.enabled) return;
        var self = debug;
        var curr = +/* @__PURE__ */ new Date();
        var ms = curr - (prevTime || curr);
        self.diff = ms;
        self.prev = prevTime;
        self.curr = curr;
        prevTime = curr;
        var args = new Array(arguments.length);
        for (var i = 0; i < args.length; i++) {
          args[i] = arguments[i];
        }
        args[0] = exports.coerce(args[0]);
        if ("string" !== typeof args[0]) {
          args.unshift("%O");
        }
        var index = 0;
        args[0] = args[0].replace(/%([a-zA-Z%])/g, function(match, format) {
          if (match === "%%") return match;
          index++;
          var formatter = exports.formatters[format];
          if ("function" === typeof formatter) {
            var val = args[index];
            match = formatter.call(self, val);
            args.splice(index, 1);
            index--;
          }
          return match;
        });
        exports.formatArgs.call(self, args);
        var logFn = debug.log || exports.log || console.log.bind(console);
        logFn.apply(self, args);
      }
      debug.namespace = namespace;
      debug.enabled = exports.enabled(namespace);
      debug.useColors = exports.useColors();
      debug.color = selectColor(namespace);
      if ("function" === typeof exports.init) {
        exports.init(debug);
      }
      return debug;
    }
    function enable(namespaces) {
      exports.save(namespaces);
      exports.names = [];
      exports.skips = [];
      var split = (typeof namespaces === "string" ? namespaces : "").split(/[\s,]+/);
      var len = split.length;
      for (var i = 0; i < len; i++) {
        if (!split[i]) continue;
        namespaces = split[i].replace(/\*/g, ".*?");
        if (namespaces[0] === "-") {
          exports.skips.push(new RegExp("^" + namespaces.substr(1) + "$"));
        } else {
          exports.names.push(new RegExp("^" + namespaces + "$"));
        }
      }
    }
    function disable() {
      exports.enable("");
    }
    function enabled(name) {
      var i, len;
      for (i = 0, len = exports.skips.length; i < len; i++) {
        if (exports.skips[i].test(name)) {
          return false;
        }
      }
      for (i = 0, len = exports.names.length; i < len; i++) {
        if (exports.names[i].test(name)) {
          return true;
        }
      }
      return false;
    }
    function coerce(val) {
      if (val instanceof Error) return val.stack || val.message;
      return val;
    }
  }
});

// node_modules/debug/src/browser.js
var require_browser = __commonJS({
  "node_modules/debug/src/browser.js"(exports, module) {
    exports = module.exports = require_debug();
    exports.log = log;
    exports.formatArgs = formatArgs;
    exports.save = save;
    exports.load = load;
    exports.useColors = useColors;
    exports.storage = "undefined" != typeof chrome && "undefined" != typeof chrome.storage ? chrome.storage.local : localstorage();
    exports.colors = [
      "lightseagreen",
      "forestgreen",
      "goldenrod",
      "dodgerblue",
      "darkorchid",
      "crimson"
    ];
    function useColors() {
      if (typeof window !== "undefined" && window.process && window.process.type === "renderer") {
        return true;
      }
      return typeof document !== "undefined" && document.documentElement && document.documentElement.style && document.documentElement.style.WebkitAppearance || // is firebug? http://stackoverflow.com/a/398120/376773
      typeof window !== "undefined" && window.console && (window.console.firebug || window.console.exception && window.console.table) || // is firefox >= v31?
      // https://developer.mozilla.org/en-US/docs/Tools/Web_Console#Styling_messages
      typeof navigator !== "undefined" && navigator.userAgent && navigator.userAgent.toLowerCase().match(/firefox\/(\d+)/) && parseInt(RegExp.$1, 10) >= 31 || // double check webkit in userAgent just in case we are in a worker
      typeof navigator !== "undefined" && navigator.userAgent && navigator.userAgent.toLowerCase().match(/applewebkit\/(\d+)/);
    }
    exports.formatters.j = function(v) {
      try {
        return JSON.stringify(v);
      } catch (err) {
        return "[UnexpectedJSONParseError]: " + err.message;
      }
    };
    function formatArgs(args) {
      var useColors2 = this.useColors;
      args[0] = (useColors2 ? "%c" : "") + this.namespace + (useColors2 ? " %c" : " ") + args[0] + (useColors2 ? "%c " : " ") + "+" + exports.humanize(this.diff);
      if (!useColors2) return;
      var c = "color: " + this.color;
      args.splice(1, 0, c, "color: inherit");
      var index = 0;
      var lastC = 0;
      args[0].replace(/%[a-zA-Z%]/g, function(match) {
        if ("%%" === match) return;
        index++;
        if ("%c" === match) {
          lastC = index;
        }
      });
      args.splice(lastC, 0, c);
    }
    function log() {
      return "object" === typeof console && console.log && Function.prototype.apply.call(console.log, console, arguments);
    }
    function save(namespaces) {
      try {
        if (null == namespaces) {
          exports.storage.removeItem("debug");
        } else {
          exports.storage.debug = namespaces;
        }
      } catch (e) {
      }
    }
    function load() {
      var r;
      try {
        r = exports.storage.debug;
      } catch (e) {
      }
      if (!r && typeof process !== "undefined" && "env" in process) {
        r = process.env.DEBUG;
      }
      return r;
    }
    exports.enable(load());
    function localstorage() {
      try {
        return window.localStorage;
      } catch (e) {
      }
    }
  }
});

// node_modules/debug/src/node.js
var require_node = __commonJS({
  "node_modules/debug/src/node.js"(exports, module) {
    var tty = __require("tty");
    var util = __require("util");
    exports = module.exports = require_debug();
    exports.init = init;
    exports.log = log;
    exports.formatArgs = formatArgs;
    exports.save = save;
    exports.load = load;
    exports.useColors = useColors;
    exports.colors = [6, 2, 3, 4, 5, 1];
    exports.inspectOpts = Object.keys(process.env).filter(function(key) {
      return /^debug_/i.test(key);
    }).reduce(function(obj, key) {
      var prop = key.substring(6).toLowerCase().replace(/_([a-z])/g, function(_, k) {
        return k.toUpperCase();
      });
      var val = process.env[key];
      if (/^(yes|on|true|enabled)$/i.test(val)) val = true;
      else if (/^(no|off|false|disabled)$/i.test(val)) val = false;
      else if (val === "null") val = null;
      else val = Number(val);
      obj[prop] = val;
      return obj;
    }, {});
    var fd = parseInt(process.env.DEBUG_FD, 10) || 2;
    if (1 !== fd && 2 !== fd) {
      util.deprecate(function() {
      }, "except for stderr(2) and stdout(1), any other usage of DEBUG_FD is deprecated. Override debug.log if you want to use a different log function (https://git.io/debug_fd)")();
    }
    var stream = 1 === fd ? process.stdout : 2 === fd ? process.stderr : createWritableStdioStream(fd);
    function useColors() {
      return "colors" in exports.inspectOpts ? Boolean(exports.inspectOpts.colors) : tty.isatty(fd);
    }
    exports.formatters.o = function(v) {
      this.inspectOpts.colors = this.useColors;
      return util.inspect(v, this.inspectOpts).split("\n").map(function(str) {
        return str.trim();
      }).join(" ");
    };
    exports.formatters.O = function(v) {
      this.inspectOpts.colors = this.useColors;
      return util.inspect(v, this.inspectOpts);
    };
    function formatArgs(args) {
      var name = this.namespace;
      var useColors2 = this.useColors;
      if (useColors2) {
        var c = this.color;
        var prefix = "  \x1B[3" + c + ";1m" + name + " \x1B[0m";
        args[0] = prefix + args[0].split("\n").join("\n" + prefix);
        args.push("\x1B[3" + c + "m+" + exports.humanize(this.diff) + "\x1B[0m");
      } else {
        args[0] = (/* @__PURE__ */ new Date()).toUTCString() + " " + name + " " + args[0];
      }
    }
    function log() {
      return stream.write(util.format.apply(util, arguments) + "\n");
    }
    function save(namespaces) {
      if (null == namespaces) {
        delete process.env.DEBUG;
      } else {
        process.env.DEBUG = namespaces;
      }
    }
    function load() {
      return process.env.DEBUG;
    }
    function createWritableStdioStream(fd2) {
      var stream2;
      var tty_wrap = process.binding("tty_wrap");
      switch (tty_wrap.guessHandleType(fd2)) {
        case "TTY":
          stream2 = new tty.WriteStream(fd2);
          stream2._type = "tty";
          if (stream2._handle && stream2._handle.unref) {
            stream2._handle.unref();
          }
          break;
        case "FILE":
          var fs = __require("fs");
          stream2 = new fs.SyncWriteStream(fd2, { autoClose: false });
          stream2._type = "fs";
          break;
        case "PIPE":
        case "TCP":
          var net = __require("net");
          stream2 = new net.Socket({
            fd: fd2,
            readable: false,
            writable: true
          });
          stream2.readable = false;
          stream2.read = null;
          stream2._type = "pipe";
          if (stream2._handle && stream2._handle.unref) {
            stream2._handle.unref();
          }
          break;
        default:
          throw new Error("Implement me. Unknown stream file type!");
      }
      stream2.fd = fd2;
      stream2._isStdio = true;
      return stream2;
    }
    function init(debug) {
      debug.inspectOpts = {};
      var keys = Object.keys(exports.inspectOpts);
      for (var i = 0; i < keys.length; i++) {
        debug.inspectOpts[keys[i]] = exports.inspectOpts[keys[i]];
      }
    }
    exports.enable(load());
  }
});

// node_modules/debug/src/index.js
var require_src = __commonJS({
  "node_modules/debug/src/index.js"(exports, module) {
    if (typeof process !== "undefined" && process.type === "renderer") {
      module.exports = require_browser();
    } else {
      module.exports = require_node();
    }
  }
});

// node_modules/@stdlib/constants-float32-max/lib/index.js
var require_lib134 = __commonJS({
  "node_modules/@stdlib/constants-float32-max/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT32_MAX = 34028234663852886e22;
    module.exports = FLOAT32_MAX;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/higher_newton.js
var require_higher_newton = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/higher_newton.js"(exports, module) {
    "use strict";
    var logger = require_src();
    var gammainc = require_lib121();
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var MAX_FLOAT32 = require_lib134();
    var debug = logger("gammaincinv:higher_newton");
    function higherNewton(x0, a, m, p, q, lgama, invfp, pcase) {
      var dlnr;
      var xini;
      var ck0;
      var ck1;
      var ck2;
      var a2;
      var x2;
      var px;
      var qx;
      var xr;
      var t;
      var n;
      var r;
      var x;
      x = x0;
      t = 1;
      n = 1;
      a2 = a * a;
      xini = x0;
      do {
        x = x0;
        x2 = x * x;
        if (m === 0) {
          dlnr = (1 - a) * ln(x) + x + lgama;
          if (dlnr > ln(MAX_FLOAT32)) {
            debug("Warning: overflow problems in one or more steps of the computation. The initial approximation to the root is returned.");
            return xini;
          }
          r = exp(dlnr);
        } else {
          r = -invfp * x;
        }
        if (pcase) {
          px = gammainc(x, a, true, false);
          ck0 = -r * (px - p);
        } else {
          qx = gammainc(x, a, true, true);
          ck0 = r * (qx - q);
        }
        r = ck0;
        if (p > 1e-120 || n > 1) {
          ck1 = 0.5 * (x - a + 1) / x;
          ck2 = (2 * x2 - 4 * x * a + 4 * x + 2 * a2 - 3 * a + 1) / x2;
          ck2 /= 6;
          x0 = x + r * (1 + r * (ck1 + r * ck2));
        } else {
          x0 = x + r;
        }
        t = abs(x / x0 - 1);
        n += 1;
        x = x0;
        if (x < 0) {
          x = xini;
          n = 100;
        }
      } while (t > 2e-14 && n < 35);
      if (t > 2e-14 || n > 99) {
        debug("Warning: the number of iterations in the Newton method reached the upper limit N=35. The last value obtained for the root is given as output.");
      }
      xr = x || 0;
      return xr;
    }
    module.exports = higherNewton;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak1.js
var require_polyval_ak1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak1.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0;
      }
      return 0 + x * (1 + x * (1 + x * (1.5 + x * (2.6666666666666665 + x * (5.208333333333333 + x * 10.8)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak2.js
var require_polyval_ak2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_ak2.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 1;
      }
      return 1 + x * (1 + x * (0.3333333333333333 + x * (0.027777777777777776 + x * (-0.003703703703703704 + x * (2314814814814815e-19 + x * 5878894767783657e-20)))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/lambdaeta.js
var require_lambdaeta = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/lambdaeta.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var exp = require_lib51();
    var ln = require_lib59();
    var evalpoly = require_lib113();
    var polyvalAK1 = require_polyval_ak1();
    var polyvalAK2 = require_polyval_ak2();
    var THRESHOLD = 1e-8;
    var ONEO12 = 0.08333333333333333;
    var ONEO120 = 0.008333333333333333;
    var AK = [1, 0, 0, 0, 0, 0];
    function lambdaeta(eta) {
      var L2;
      var L3;
      var L4;
      var L5;
      var la;
      var L;
      var q;
      var r;
      var s;
      s = eta * eta * 0.5;
      if (eta === 0) {
        la = 0;
      } else if (eta < -1) {
        r = exp(-1 - s);
        la = polyvalAK1(r);
      } else if (eta < 1) {
        r = eta;
        la = polyvalAK2(r);
      } else {
        r = 11 + s;
        L = ln(r);
        la = r + L;
        r = 1 / r;
        L2 = L * L;
        L3 = L2 * L;
        L4 = L3 * L;
        L5 = L4 * L;
        AK[1] = (2 - L) * 0.5;
        AK[2] = (-9 * L + 6 + 2 * L2) / 6;
        AK[3] = -(3 * L3 + 36 * L - 22 * L2 - 12) * ONEO12;
        AK[4] = (60 + 350 * L2 - 300 * L - 125 * L3 + 12 * L4) / 60;
        AK[5] = -(-120 - 274 * L4 + 900 * L - 1700 * L2 + 1125 * L3 + 20 * L5) * ONEO120;
        la += L * r * evalpoly(AK, r);
      }
      r = 1;
      if (eta > -3.5 && eta < -0.03 || eta > 0.03 && eta < 40) {
        r = 1;
        q = la;
        do {
          la = q * (s + ln(q)) / (q - 1);
          r = abs(q / la - 1);
          q = la;
        } while (r > THRESHOLD);
      }
      return la;
    }
    module.exports = lambdaeta;
  }
});

// node_modules/@stdlib/constants-float64-ln-sqrt-two-pi/lib/index.js
var require_lib135 = __commonJS({
  "node_modules/@stdlib/constants-float64-ln-sqrt-two-pi/lib/index.js"(exports, module) {
    "use strict";
    var LN_SQRT_TWO_PI = 0.9189385332046728;
    module.exports = LN_SQRT_TWO_PI;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/chepolsum.js
var require_chepolsum = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/chepolsum.js"(exports, module) {
    "use strict";
    var A = [
      1.9963790515900766,
      -0.0017971032528832887,
      13129285796384672e-21,
      -2340875228178749e-22,
      72291210671127e-22,
      -3280997607821e-22,
      19875070901e-21,
      -1509214183e-21,
      1375340084e-22,
      -145728923e-22,
      17532367e-22,
      -2351465e-22,
      346551e-22,
      -55471e-22,
      9548e-22,
      -1748e-22,
      332e-22,
      -58e-22
    ];
    function chepolsum(n, t) {
      var tt;
      var u0;
      var u1;
      var u2;
      var k;
      u0 = 0;
      u1 = 0;
      tt = t + t;
      k = n;
      do {
        u2 = u1;
        u1 = u0;
        u0 = tt * u1 - u2 + A[k];
        k -= 1;
      } while (k >= 0);
      return (u0 - u2) / 2;
    }
    module.exports = chepolsum;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_c.js
var require_polyval_c = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_c.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.025721014990011306;
      }
      return 0.025721014990011306 + x * (0.08247596616699963 + x * (-0.0025328157302663564 + x * (6099292666946337e-19 + x * (-33543297638406e-17 + x * 250505279903e-15))));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_d.js
var require_polyval_d = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/polyval_d.js"(exports, module) {
    "use strict";
    function evalpoly(x) {
      if (x === 0) {
        return 0.08333333333333333;
      }
      return 0.08333333333333333 + x * (-0.002777777777777778 + x * (7936507936507937e-19 + x * -5952380952380953e-19));
    }
    module.exports = evalpoly;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/stirling.js
var require_stirling = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/stirling.js"(exports, module) {
    "use strict";
    var gammaln = require_lib105();
    var ln = require_lib59();
    var LN_SQRT_TWO_PI = require_lib135();
    var SMALLEST_FLOAT32 = require_lib119();
    var MAX_FLOAT32 = require_lib134();
    var chepolsum = require_chepolsum();
    var polyvalC = require_polyval_c();
    var polyvalD = require_polyval_d();
    var C6 = 0.30865217988013566;
    function stirling(x) {
      var z;
      if (x < SMALLEST_FLOAT32) {
        return MAX_FLOAT32;
      }
      if (x < 1) {
        return gammaln(x + 1) - (x + 0.5) * ln(x) + x - LN_SQRT_TWO_PI;
      }
      if (x < 2) {
        return gammaln(x) - (x - 0.5) * ln(x) + x - LN_SQRT_TWO_PI;
      }
      if (x < 3) {
        return gammaln(x - 1) - (x - 0.5) * ln(x) + x - LN_SQRT_TWO_PI + ln(x - 1);
      }
      if (x < 12) {
        z = 18 / (x * x) - 1;
        return chepolsum(17, z) / (12 * x);
      }
      z = 1 / (x * x);
      if (x < 1e3) {
        return polyvalC(z) / (C6 + z) / x;
      }
      return polyvalD(z) / x;
    }
    module.exports = stirling;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/gamstar.js
var require_gamstar = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/gamstar.js"(exports, module) {
    "use strict";
    var exp = require_lib51();
    var gamma = require_lib97();
    var ln = require_lib59();
    var FLOAT32_MAX = require_lib134();
    var SQRT_TWO_PI = require_lib95();
    var stirling = require_stirling();
    function gamstar(x) {
      if (x >= 3) {
        return exp(stirling(x));
      }
      if (x > 0) {
        return gamma(x) / (exp(-x + (x - 0.5) * ln(x)) * SQRT_TWO_PI);
      }
      return FLOAT32_MAX;
    }
    module.exports = gamstar;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak0bk0.js
var require_rational_ak0bk0 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak0bk0.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.3333333333438;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.3333333333438 + x * (-0.2070740359969 + x * (-0.05041806657154 + x * (-0.004923635739372 + x * -4293658292782e-17)));
        s2 = 1 + x * (0.7045554412463 + x * (0.2118190062224 + x * (0.03048648397436 + x * 0.001605037988091)));
      } else {
        x = 1 / x;
        s1 = -4293658292782e-17 + x * (-0.004923635739372 + x * (-0.05041806657154 + x * (-0.2070740359969 + x * -0.3333333333438)));
        s2 = 0.001605037988091 + x * (0.03048648397436 + x * (0.2118190062224 + x * (0.7045554412463 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps1.js
var require_eps1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps1.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ln = require_lib59();
    var lambdaeta = require_lambdaeta();
    var rateval = require_rational_ak0bk0();
    function eps1(eta) {
      var la;
      if (abs(eta) < 1) {
        return rateval(eta);
      }
      la = lambdaeta(eta);
      return ln(eta / (la - 1)) / eta;
    }
    module.exports = eps1;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak1bk1.js
var require_rational_ak1bk1 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak1bk1.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0172847633523;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0172847633523 + x * (-0.0159372646475 + x * (-0.00464910887221 + x * (-60683488776e-14 + x * -614830384279e-17)));
        s2 = 1 + x * (0.764050615669 + x * (0.297143406325 + x * (0.0579490176079 + x * 0.00574558524851)));
      } else {
        x = 1 / x;
        s1 = -614830384279e-17 + x * (-60683488776e-14 + x * (-0.00464910887221 + x * (-0.0159372646475 + x * -0.0172847633523)));
        s2 = 0.00574558524851 + x * (0.0579490176079 + x * (0.297143406325 + x * (0.764050615669 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak2bk2.js
var require_rational_ak2bk2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak2bk2.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0172839517431;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0172839517431 + x * (-0.0146362417966 + x * (-0.00357406772616 + x * (-391032032692e-15 + x * 249634036069e-17)));
        s2 = 1 + x * (0.690560400696 + x * (0.249962384741 + x * (0.0443843438769 + x * 0.00424073217211)));
      } else {
        x = 1 / x;
        s1 = 249634036069e-17 + x * (-391032032692e-15 + x * (-0.00357406772616 + x * (-0.0146362417966 + x * -0.0172839517431)));
        s2 = 0.00424073217211 + x * (0.0443843438769 + x * (0.249962384741 + x * (0.690560400696 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak3bk3.js
var require_rational_ak3bk3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak3bk3.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.99994466948;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.99994466948 + x * (104.649839762 + x * (857.204033806 + x * (731.901559577 + x * 45.5174411671)));
        s2 = 1 + x * (104.526456943 + x * (823.313447808 + x * (3119.93802124 + x * 3970.03311219)));
      } else {
        x = 1 / x;
        s1 = 45.5174411671 + x * (731.901559577 + x * (857.204033806 + x * (104.649839762 + x * 0.99994466948)));
        s2 = 3970.03311219 + x * (3119.93802124 + x * (823.313447808 + x * (104.526456943 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps2.js
var require_eps2 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps2.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var rateval1 = require_rational_ak1bk1();
    var rateval2 = require_rational_ak2bk2();
    var rateval3 = require_rational_ak3bk3();
    function eps2(eta) {
      var lnmeta;
      var x;
      if (eta < -5) {
        x = eta * eta;
        lnmeta = ln(-eta);
        return (12 - x - 6 * (lnmeta * lnmeta)) / (12 * x * eta);
      }
      if (eta < -2) {
        return rateval1(eta);
      }
      if (eta < 2) {
        return rateval2(eta);
      }
      if (eta < 1e3) {
        x = 1 / eta;
        return rateval3(eta) / (-12 * eta);
      }
      return -1 / (12 * eta);
    }
    module.exports = eps2;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak4bk4.js
var require_rational_ak4bk4 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak4bk4.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.0495346498136;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.0495346498136 + x * (0.0299521337141 + x * (0.00688296911516 + x * (512634846317e-15 + x * -201411722031e-16)));
        s2 = 1 + x * (0.759803615283 + x * (0.261547111595 + x * (0.0464854522477 + x * 0.00403751193496)));
      } else {
        x = 1 / x;
        s1 = -201411722031e-16 + x * (512634846317e-15 + x * (0.00688296911516 + x * (0.0299521337141 + x * 0.0495346498136)));
        s2 = 0.00403751193496 + x * (0.0464854522477 + x * (0.261547111595 + x * (0.759803615283 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak5bk5.js
var require_rational_ak5bk5 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak5bk5.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.00452313583942;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.00452313583942 + x * (0.00120744920113 + x * (-789724156582e-16 + x * (-504476066942e-16 + x * -535770949796e-17)));
        s2 = 1 + x * (0.912203410349 + x * (0.405368773071 + x * (0.0901638932349 + x * 0.00948935714996)));
      } else {
        x = 1 / x;
        s1 = -535770949796e-17 + x * (-504476066942e-16 + x * (-789724156582e-16 + x * (0.00120744920113 + x * 0.00452313583942)));
        s2 = 0.00948935714996 + x * (0.0901638932349 + x * (0.405368773071 + x * (0.912203410349 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak6bk6.js
var require_rational_ak6bk6 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak6bk6.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return 0.00439937562904;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = 0.00439937562904 + x * (487225670639e-15 + x * (-128470657374e-15 + x * (529110969589e-17 + x * 15716677175e-17)));
        s2 = 1 + x * (0.794435257415 + x * (0.333094721709 + x * (0.0703527806143 + x * 0.00806110846078)));
      } else {
        x = 1 / x;
        s1 = 15716677175e-17 + x * (529110969589e-17 + x * (-128470657374e-15 + x * (487225670639e-15 + x * 0.00439937562904)));
        s2 = 0.00806110846078 + x * (0.0703527806143 + x * (0.333094721709 + x * (0.794435257415 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak7bk7.js
var require_rational_ak7bk7 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak7bk7.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -0.0011481191232;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -0.0011481191232 + x * (-0.112850923276 + x * (1.51623048511 + x * (-0.218472031183 + x * 0.0730002451555)));
        s2 = 1 + x * (14.2482206905 + x * (69.7360396285 + x * (218.938950816 + x * 277.067027185)));
      } else {
        x = 1 / x;
        s1 = 0.0730002451555 + x * (-0.218472031183 + x * (1.51623048511 + x * (-0.112850923276 + x * -0.0011481191232)));
        s2 = 277.067027185 + x * (218.938950816 + x * (69.7360396285 + x * (14.2482206905 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak8bk8.js
var require_rational_ak8bk8 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/rational_ak8bk8.js"(exports, module) {
    "use strict";
    function evalrational(x) {
      var ax;
      var s1;
      var s2;
      if (x === 0) {
        return -145727889667e-15;
      }
      if (x < 0) {
        ax = -x;
      } else {
        ax = x;
      }
      if (ax <= 1) {
        s1 = -145727889667e-15 + x * (-0.290806748131 + x * (-13.308504545 + x * (199.722374056 + x * -11.4311378756)));
        s2 = 1 + x * (139.612587808 + x * (2189.01116348 + x * (7115.24019009 + x * 45574.6081453)));
      } else {
        x = 1 / x;
        s1 = -11.4311378756 + x * (199.722374056 + x * (-13.308504545 + x * (-0.290806748131 + x * -145727889667e-15)));
        s2 = 45574.6081453 + x * (7115.24019009 + x * (2189.01116348 + x * (139.612587808 + x * 1)));
      }
      return s1 / s2;
    }
    module.exports = evalrational;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/eps3.js
var require_eps3 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/eps3.js"(exports, module) {
    "use strict";
    var ln = require_lib59();
    var rational1 = require_rational_ak4bk4();
    var rational2 = require_rational_ak5bk5();
    var rational3 = require_rational_ak6bk6();
    var rational4 = require_rational_ak7bk7();
    var rational5 = require_rational_ak8bk8();
    function eps3(eta) {
      var x;
      var y;
      if (eta < -8) {
        x = eta * eta;
        y = ln(-eta) / eta;
        return (-30 + eta * y * (6 * x * y * y - 12 + x)) / (12 * eta * x * x);
      }
      if (eta < -4) {
        return rational1(eta) / (eta * eta);
      }
      if (eta < -2) {
        return rational2(eta);
      }
      if (eta < 2) {
        return rational3(eta);
      }
      if (eta < 10) {
        x = 1 / eta;
        return rational4(x) / (eta * eta);
      }
      if (eta < 100) {
        x = 1 / eta;
        return rational5(x) / (eta * eta);
      }
      return -ln(eta) / (12 * eta * eta * eta);
    }
    module.exports = eps3;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/compute.js
var require_compute = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/compute.js"(exports, module) {
    "use strict";
    var logger = require_src();
    var evalpoly = require_lib113();
    var gammaln = require_lib105();
    var erfcinv = require_lib130();
    var gamma = require_lib97();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var min = require_lib82();
    var pow = require_lib75();
    var ln = require_lib59();
    var SQRT_TWO_PI = require_lib95();
    var MAX_FLOAT32 = require_lib134();
    var TWO_PI = require_lib115();
    var higherNewton = require_higher_newton();
    var lambdaeta = require_lambdaeta();
    var gamstar = require_gamstar();
    var eps1 = require_eps1();
    var eps2 = require_eps2();
    var eps3 = require_eps3();
    var debug = logger("gammaincinv:compute");
    var HALF = 0.5;
    var ONEO3 = 0.3333333333333333;
    var ONEO4 = 0.25;
    var ONEO5 = 0.2;
    var ONEO6 = 0.16666666666666666;
    var ONEO12 = 0.08333333333333333;
    var ONEO24 = 0.041666666666666664;
    var CK = [0, 0, 0, 0, 0];
    function compute(a, p, q) {
      var ap1inv;
      var invfp;
      var lgama;
      var pcase;
      var porq;
      var ainv;
      var logr;
      var ap22;
      var ap14;
      var ap13;
      var ap12;
      var vgam;
      var vmin;
      var xini;
      var ap1;
      var ap2;
      var ap3;
      var eta;
      var p6;
      var p5;
      var x0;
      var a2;
      var L2;
      var L3;
      var L4;
      var b2;
      var b3;
      var p3;
      var a4;
      var fp;
      var p4;
      var p2;
      var a3;
      var xr;
      var ck;
      var b;
      var L;
      var i;
      var k;
      var m;
      var r;
      var s;
      var t;
      var y;
      if (p < HALF) {
        pcase = true;
        porq = p;
        s = -1;
      } else {
        pcase = false;
        porq = q;
        s = 1;
      }
      k = 0;
      if (abs(a - 1) < 1e-4) {
        m = 0;
        if (pcase) {
          if (p < 1e-3) {
            p2 = p * p;
            p3 = p2 * p;
            p4 = p3 * p;
            p5 = p4 * p;
            p6 = p5 * p;
            x0 = p + p2 * HALF + p3 * ONEO3 + p4 * ONEO4 + p5 * ONEO5 + p6 * ONEO6;
          } else {
            x0 = -ln(1 - p);
          }
        } else {
          x0 = -ln(q);
        }
        if (a === 1) {
          k = 2;
          xr = x0;
        } else {
          lgama = gammaln(a);
          k = 1;
        }
      }
      if (q < 1e-30 && a < HALF) {
        m = 0;
        x0 = -ln(q * gamma(a)) + (a - 1) * ln(-ln(q * gamma(a)));
        k = 1;
        lgama = gammaln(a);
      }
      if (a > 1 && a < 500 && p < 1e-80) {
        m = 0;
        ainv = 1 / a;
        ap1inv = 1 / (a + 1);
        x0 = (gammaln(a + 1) + ln(p)) * ainv;
        x0 = exp(x0);
        xini = x0;
        for (i = 0; i < 10; i++) {
          x0 = xini * exp(x0 * ainv) * pow(1 - x0 * ap1inv, ainv);
        }
        k = 1;
        lgama = gammaln(a);
      }
      logr = 1 / a * (ln(p) + gammaln(a + 1));
      if (logr < ln(ONEO5 * (1 + a)) && k === 0) {
        r = exp(logr);
        m = 0;
        a2 = a * a;
        a3 = a2 * a;
        a4 = a3 * a;
        ap1 = a + 1;
        ap12 = ap1 * ap1;
        ap13 = ap1 * ap12;
        ap14 = ap12 * ap12;
        ap2 = a + 2;
        ap22 = ap2 * ap2;
        ap3 = a + 3;
        CK[0] = 1;
        CK[1] = 1 / ap1;
        CK[2] = HALF * (3 * a + 5) / (ap12 * ap2);
        CK[3] = ONEO3 * (31 + 8 * a2 + 33 * a) / (ap13 * ap2 * ap3);
        CK[4] = ONEO24 * (2888 + 1179 * a3 + 125 * a4 + 3971 * a2 + 5661 * a) / (ap14 * ap22 * ap3 * (a + 4));
        x0 = r * evalpoly(CK, r);
        lgama = gammaln(a);
        k = 1;
      }
      if (a < 10 && k === 0) {
        vgam = sqrt(a) / (gamstar(a) * SQRT_TWO_PI);
        vmin = min(0.02, vgam);
        if (q < vmin) {
          m = 0;
          b = 1 - a;
          b2 = b * b;
          b3 = b2 * b;
          eta = sqrt(-2 / a * ln(q / vgam));
          x0 = a * lambdaeta(eta);
          L = ln(x0);
          if (x0 > 5) {
            L2 = L * L;
            L3 = L2 * L;
            L4 = L3 * L;
            r = 1 / x0;
            CK[0] = L - 1;
            CK[1] = (3 * b - 2 * b * L + L2 - 2 * L + 2) * HALF;
            CK[2] = (24 * b * L - 11 * b2 - 24 * b - 6 * L2 + 12 * L - 12 - 9 * b * L2 + 6 * b2 * L + 2 * L3) * ONEO6;
            CK[3] = (-12 * b3 * L + 8.04 * b * L2 - 114 * b2 * L + (72 + 36 * L2) + (3 * L4 - 72 * L + 162) * (b - 168 * b * L) - (12 * L3 + 25 * b3) - (22 * b * L3 + 36 * b2 * L2 + 120 * b2)) * ONEO12;
            CK[4] = 0;
            x0 = x0 - L + b * r * evalpoly(CK, r);
          } else {
            r = 1 / x0;
            L2 = L * L;
            ck = L - 1;
            t = L - b * r * ck;
            if (t < x0) {
              x0 -= t;
            }
          }
          lgama = gammaln(a);
          k = 1;
        }
      }
      if (abs(porq - HALF) < 1e-5 && k === 0) {
        m = 0;
        ainv = 1 / a;
        x0 = a - ONEO3 + (0.019753086419753086 + 0.007211444248481286 * ainv) * ainv;
        lgama = gammaln(a);
        k = 1;
      }
      if (a < 1 && k === 0) {
        m = 0;
        if (pcase) {
          x0 = exp(1 / a * (ln(porq) + gammaln(a + 1)));
        } else {
          x0 = exp(1 / a * (ln(1 - porq) + gammaln(a + 1)));
        }
        lgama = gammaln(a);
        k = 1;
      }
      if (k === 0) {
        m = 1;
        ainv = 1 / a;
        r = erfcinv(2 * porq);
        eta = s * r / sqrt(a * HALF);
        if (r < MAX_FLOAT32) {
          eta += (eps1(eta) + (eps2(eta) + eps3(eta) * ainv) * ainv) * ainv;
          x0 = a * lambdaeta(eta);
          y = eta;
          fp = -sqrt(a / TWO_PI) * exp(-HALF * a * y * y) / gamstar(a);
          invfp = 1 / fp;
        } else {
          debug("Warning: Overflow problems in one or more steps of the computation.");
          return NaN;
        }
      }
      if (k < 2) {
        xr = higherNewton(x0, a, m, p, q, lgama, invfp, pcase);
      }
      return xr;
    }
    module.exports = compute;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/main.js
var require_main95 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/main.js"(exports, module) {
    "use strict";
    var isnan = require_lib6();
    var FLOAT32_SMALLEST = require_lib119();
    var PINF = require_lib12();
    var compute = require_compute();
    function gammaincinv(p, a, upper) {
      if (isnan(p) || isnan(a)) {
        return NaN;
      }
      if (a < FLOAT32_SMALLEST) {
        return NaN;
      }
      if (p > 1 || p < 0) {
        return NaN;
      }
      if (upper === true) {
        if (p === 0) {
          return PINF;
        }
        if (p === 1) {
          return 0;
        }
        return compute(a, 1 - p, p);
      }
      if (p === 0) {
        return 0;
      }
      if (p === 1) {
        return PINF;
      }
      return compute(a, p, 1 - p);
    }
    module.exports = gammaincinv;
  }
});

// node_modules/@stdlib/math-base-special-gammaincinv/lib/index.js
var require_lib136 = __commonJS({
  "node_modules/@stdlib/math-base-special-gammaincinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main95();
    module.exports = main2;
  }
});

// node_modules/@stdlib/constants-float64-smallest-subnormal/lib/index.js
var require_lib137 = __commonJS({
  "node_modules/@stdlib/constants-float64-smallest-subnormal/lib/index.js"(exports, module) {
    "use strict";
    var FLOAT64_SMALLEST_SUBNORMAL = 5e-324;
    module.exports = FLOAT64_SMALLEST_SUBNORMAL;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme3.js
var require_temme3 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/temme3.js"(exports, module) {
    "use strict";
    var gammaincinv = require_lib136();
    var ln = require_lib59();
    var sqrt = require_lib54();
    var SMALLEST_SUBNORMAL = require_lib137();
    var temmeRootFinder = require_root_finder();
    var newtonRaphsonIterate = require_newton_raphson();
    function temme3(a, b, p, q) {
      var cross;
      var roots;
      var lower;
      var upper;
      var eta0;
      var eta;
      var w10;
      var w12;
      var w13;
      var w14;
      var e1;
      var e2;
      var e3;
      var mu;
      var d2;
      var d3;
      var d4;
      var w2;
      var w3;
      var w4;
      var w5;
      var w6;
      var w7;
      var w8;
      var w9;
      var w1;
      var d;
      var w;
      var u;
      var x;
      if (p < q) {
        eta0 = gammaincinv(p, b, true);
      } else {
        eta0 = gammaincinv(q, b, false);
      }
      eta0 /= a;
      mu = b / a;
      w = sqrt(1 + mu);
      w2 = w * w;
      w3 = w2 * w;
      w4 = w2 * w2;
      w5 = w3 * w2;
      w6 = w3 * w3;
      w7 = w4 * w3;
      w8 = w4 * w4;
      w9 = w5 * w4;
      w10 = w5 * w5;
      d = eta0 - mu;
      d2 = d * d;
      d3 = d2 * d;
      d4 = d2 * d2;
      w1 = w + 1;
      w12 = w1 * w1;
      w13 = w1 * w12;
      w14 = w12 * w12;
      e1 = (w + 2) * (w - 1) / (3 * w);
      e1 += (w3 + 9 * w2 + 21 * w + 5) * d / (36 * w2 * w1);
      e1 -= (w4 - 13 * w3 + 69 * w2 + 167 * w + 46) * d2 / (1620 * w12 * w3);
      e1 -= (7 * w5 + 21 * w4 + 70 * w3 + 26 * w2 - 93 * w - 31) * d3 / (6480 * w13 * w4);
      e1 -= (75 * w6 + 202 * w5 + 188 * w4 - 888 * w3 - 1345 * w2 + 118 * w + 138) * d4 / (272160 * w14 * w5);
      e2 = (28 * w4 + 131 * w3 + 402 * w2 + 581 * w + 208) * (w - 1) / (1620 * w1 * w3);
      e2 -= (35 * w6 - 154 * w5 - 623 * w4 - 1636 * w3 - 3983 * w2 - 3514 * w - 925) * d / (12960 * w12 * w4);
      e2 -= (2132 * w7 + 7915 * w6 + 16821 * w5 + 35066 * w4 + 87490 * w3 + 141183 * w2 + 95993 * w + 21640) * d2 / (816480 * w5 * w13);
      e2 -= (11053 * w8 + 53308 * w7 + 117010 * w6 + 163924 * w5 + 116188 * w4 - 258428 * w3 - 677042 * w2 - 481940 * w - 105497) * d3 / (14696640 * w14 * w6);
      e3 = -((3592 * w7 + 8375 * w6 - 1323 * w5 - 29198 * w4 - 89578 * w3 - 154413 * w2 - 116063 * w - 29632) * (w - 1)) / (816480 * w5 * w12);
      e3 -= (442043 * w9 + 2054169 * w8 + 3803094 * w7 + 3470754 * w6 + 2141568 * w5 - 2393568 * w4 - 19904934 * w3 - 34714674 * w2 - 23128299 * w - 5253353) * d / (146966400 * w6 * w13);
      e3 -= (116932 * w10 + 819281 * w9 + 2378172 * w8 + 4341330 * w7 + 6806004 * w6 + 10622748 * w5 + 18739500 * w4 + 30651894 * w3 + 30869976 * w2 + 15431867 * w + 2919016) * d2 / (146966400 * w14 * w7);
      eta = eta0 + e1 / a + e2 / (a * a) + e3 / (a * a * a);
      if (eta <= 0) {
        eta = SMALLEST_SUBNORMAL;
      }
      u = eta - mu * ln(eta) + (1 + mu) * ln(1 + mu) - mu;
      cross = 1 / (1 + mu);
      lower = eta < mu ? cross : 0;
      upper = eta < mu ? 1 : cross;
      x = (lower + upper) / 2;
      roots = temmeRootFinder(u, mu);
      return newtonRaphsonIterate(roots, x, lower, upper, 32, 100);
    }
    module.exports = temme3;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/halley_iterate.js
var require_halley_iterate = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/halley_iterate.js"(exports, module) {
    "use strict";
    var abs = require_lib46();
    var ldexp = require_lib50();
    var sign = require_lib133();
    var max = require_lib80();
    var MAX_VALUE = require_lib83();
    function halleyIterate(fun, guess, minimum, maximum, digits, maxIter) {
      var convergence;
      var outOfBounds;
      var delta1;
      var delta2;
      var factor;
      var result;
      var f0Last;
      var count;
      var delta;
      var denom;
      var diff;
      var num;
      var res;
      var f0;
      var f1;
      var f2;
      f0 = 0;
      outOfBounds = false;
      result = guess;
      factor = ldexp(1, 1 - digits);
      delta = max(1e7 * guess, 1e7);
      f0Last = 0;
      delta1 = delta;
      delta2 = delta;
      count = maxIter;
      do {
        f0Last = f0;
        delta2 = delta1;
        delta1 = delta;
        res = fun(result);
        f0 = res[0];
        f1 = res[1];
        f2 = res[2];
        count -= 1;
        if (f0 === 0) {
          break;
        }
        if (f1 === 0) {
          if (f0Last === 0) {
            if (result === minimum) {
              guess = maximum;
            } else {
              guess = minimum;
            }
            f0Last = fun(guess);
            delta = guess - result;
          }
          if (sign(f0Last) * sign(f0) < 0) {
            if (delta < 0) {
              delta = (result - minimum) / 2;
            } else {
              delta = (result - maximum) / 2;
            }
          } else if (delta < 0) {
            delta = (result - maximum) / 2;
          } else {
            delta = (result - minimum) / 2;
          }
        } else if (f2 === 0) {
          delta = f0 / f1;
        } else {
          denom = 2 * f0;
          num = 2 * f1 - f0 * (f2 / f1);
          if (abs(num) < 1 && abs(denom) >= abs(num) * MAX_VALUE) {
            delta = f0 / f1;
          } else {
            delta = denom / num;
          }
          if (delta * f1 / f0 < 0) {
            delta = f0 / f1;
            if (abs(delta) > 2 * abs(guess)) {
              delta = (delta < 0 ? -1 : 1) * 2 * abs(guess);
            }
          }
        }
        convergence = abs(delta / delta2);
        if (convergence > 0.8 && convergence < 2) {
          delta = delta > 0 ? (result - minimum) / 2 : (result - maximum) / 2;
          if (abs(delta) > result) {
            delta = sign(delta) * result;
          }
          delta2 = delta * 3;
        }
        guess = result;
        result -= delta;
        if (result < minimum) {
          if (abs(minimum) < 1 && abs(result) > 1 && MAX_VALUE / abs(result) < abs(minimum)) {
            diff = 1e3;
          } else {
            diff = result / minimum;
          }
          if (abs(diff) < 1) {
            diff = 1 / diff;
          }
          if (!outOfBounds && diff > 0 && diff < 3) {
            delta = 0.99 * (guess - minimum);
            result = guess - delta;
            outOfBounds = true;
          } else {
            delta = (guess - minimum) / 2;
            result = guess - delta;
            if (result === minimum || result === maximum) {
              break;
            }
          }
        } else if (result > maximum) {
          if (abs(maximum) < 1 && abs(result) > 1 && MAX_VALUE / abs(result) < abs(maximum)) {
            diff = 1e3;
          } else {
            diff = result / maximum;
          }
          if (abs(diff) < 1) {
            diff = 1 / diff;
          }
          if (!outOfBounds && diff > 0 && diff < 3) {
            delta = 0.99 * (guess - maximum);
            result = guess - delta;
            outOfBounds = true;
          } else {
            delta = (guess - maximum) / 2;
            result = guess - delta;
            if (result === minimum || result === maximum) {
              break;
            }
          }
        }
        if (delta > 0) {
          maximum = guess;
        } else {
          minimum = guess;
        }
      } while (count && abs(result * factor) < abs(delta));
      return result;
    }
    module.exports = halleyIterate;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/ibeta_roots.js
var require_ibeta_roots = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/ibeta_roots.js"(exports, module) {
    "use strict";
    var kernelBetainc = require_lib127().assign;
    var abs = require_lib46();
    var FLOAT64_MAX = require_lib83();
    var FLOAT64_MIN_NORM = require_lib45();
    function ibetaRoots(a, b, target, invert) {
      return roots;
      function roots(x) {
        var buf;
        var f1;
        var f2;
        var f;
        var y;
        y = 1 - x;
        buf = [0, 0];
        kernelBetainc(x, a, b, true, invert, buf, 1, 0);
        f = buf[0] - target;
        f1 = buf[1];
        if (invert) {
          f1 = -f1;
        }
        if (y === 0) {
          y = FLOAT64_MIN_NORM * 64;
        }
        if (x === 0) {
          x = FLOAT64_MIN_NORM * 64;
        }
        f2 = f1 * (-(y * a) + (b - 2) * x + 1);
        if (abs(f2) < y * x * FLOAT64_MAX) {
          f2 /= y * x;
        }
        if (invert) {
          f2 = -f2;
        }
        if (f1 === 0) {
          f1 = (invert ? -1 : 1) * FLOAT64_MIN_NORM * 64;
        }
        return [f, f1, f2];
      }
    }
    module.exports = ibetaRoots;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/main.js
var require_main96 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/main.js"(exports, module) {
    "use strict";
    var evalpoly = require_lib113();
    var betainc = require_lib128();
    var expm1 = require_lib64();
    var log1p = require_lib65();
    var asin = require_lib67();
    var beta = require_lib78();
    var sqrt = require_lib54();
    var abs = require_lib46();
    var exp = require_lib51();
    var pow = require_lib75();
    var sin = require_lib94();
    var max = require_lib80();
    var min = require_lib82();
    var ln = require_lib59();
    var FLOAT64_MIN_NORM = require_lib45();
    var HALF_PI = require_lib85();
    var EPSILON = require_lib77();
    var findIBetaInvFromTDist = require_find_ibeta_inv_from_t_dist();
    var temme1 = require_temme1();
    var temme2 = require_temme2();
    var temme3 = require_temme3();
    var halleyIterate = require_halley_iterate();
    var ibetaRoots = require_ibeta_roots();
    var DIGITS = 32;
    var MAX_ITERATIONS = 1e3;
    var terms = [0, 0, 0, 0, 0];
    function ibetaInvImp(a, b, p, q) {
      var digits;
      var invert;
      var lambda;
      var lower;
      var theta;
      var upper;
      var roots;
      var maxv;
      var minv;
      var bet;
      var ppa;
      var tmp;
      var xs2;
      var ap1;
      var bm1;
      var fs;
      var lx;
      var ps;
      var xg;
      var xs;
      var yp;
      var a2;
      var a3;
      var b2;
      var r;
      var l;
      var u;
      var x;
      var y;
      invert = false;
      if (q === 0) {
        return [1, 0];
      }
      if (p === 0) {
        return [0, 1];
      }
      if (a === 1) {
        if (b === 1) {
          return [p, 1 - p];
        }
        tmp = b;
        b = a;
        a = tmp;
        tmp = q;
        q = p;
        p = tmp;
        invert = true;
      }
      x = 0;
      lower = 0;
      upper = 1;
      if (a === 0.5) {
        if (b === 0.5) {
          x = sin(p * HALF_PI);
          x *= x;
          y = sin(q * HALF_PI);
          y *= y;
          return [x, y];
        }
        if (b > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
      }
      if (b === 0.5 && a >= 0.5 && p !== 1) {
        yp = {};
        x = findIBetaInvFromTDist(a, p, yp);
        y = yp.value;
      } else if (b === 1) {
        if (p < q) {
          if (a > 1) {
            x = pow(p, 1 / a);
            y = -expm1(ln(p) / a);
          } else {
            x = pow(p, 1 / a);
            y = 1 - x;
          }
        } else {
          x = exp(log1p(-q) / a);
          y = -expm1(log1p(-q) / a);
        }
        if (invert) {
          tmp = y;
          y = x;
          x = tmp;
        }
        return [x, y];
      } else if (a + b > 5) {
        if (p > 0.5) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
        minv = min(a, b);
        maxv = max(a, b);
        if (sqrt(minv) > maxv - minv && minv > 5) {
          x = temme1(a, b, p);
          y = 1 - x;
        } else {
          r = a + b;
          theta = asin(sqrt(a / r));
          lambda = minv / r;
          if (lambda >= 0.2 && lambda <= 0.8 && r >= 10) {
            ppa = pow(p, 1 / a);
            if (ppa < 25e-4 && a + b < 200) {
              x = ppa * pow(a * beta(a, b), 1 / a);
            } else {
              x = temme2(p, r, theta);
            }
            y = 1 - x;
          } else {
            if (a < b) {
              tmp = b;
              b = a;
              a = tmp;
              tmp = q;
              q = p;
              p = tmp;
              invert = !invert;
            }
            bet = 0;
            if (b < 2) {
              bet = beta(a, b);
            }
            if (bet === 0) {
              y = 1;
            } else {
              y = pow(b * q * bet, 1 / b);
              x = 1 - y;
            }
          }
          if (y > 1e-5) {
            x = temme3(a, b, p, q);
            y = 1 - x;
          }
        }
      } else if (a < 1 && b < 1) {
        xs = (1 - a) / (2 - a - b);
        fs = betainc(xs, a, b) - p;
        if (abs(fs) / p < EPSILON * 3) {
          if (invert) {
            return [1 - xs, xs];
          }
          return [xs, 1 - xs];
        }
        if (fs < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
          xs = 1 - xs;
        }
        xg = pow(a * p * beta(a, b), 1 / a);
        x = xg / (1 + xg);
        y = 1 / (1 + xg);
        if (x > xs) {
          x = xs;
        }
        upper = xs;
      } else if (a > 1 && b > 1) {
        xs = (a - 1) / (a + b - 2);
        xs2 = (b - 1) / (a + b - 2);
        ps = betainc(xs, a, b) - p;
        if (ps < 0) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          tmp = xs2;
          xs2 = xs;
          xs = tmp;
          invert = !invert;
        }
        lx = ln(p * a * beta(a, b)) / a;
        x = exp(lx);
        y = x < 0.9 ? 1 - x : -expm1(lx);
        if (b < a && x < 0.2) {
          ap1 = a - 1;
          bm1 = b - 1;
          a2 = a * a;
          a3 = a * a2;
          b2 = b * b;
          terms[0] = 0;
          terms[1] = 1;
          terms[2] = bm1 / ap1;
          ap1 *= ap1;
          terms[3] = bm1 * (3 * a * b + 5 * b + a2 - a - 4) / (2 * (a + 2) * ap1);
          ap1 *= a + 1;
          terms[4] = bm1 * (33 * a * b2 + 31 * b2 + 8 * a2 * b2 - 30 * a * b - 47 * b + 11 * a2 * b + 6 * a3 * b + 18 + 4 * a - a3 + a2 * a2 - 10 * a2);
          terms[4] /= 3 * (a + 3) * (a + 2) * ap1;
          x = evalpoly(terms, x);
        }
        if (x > xs) {
          x = xs;
        }
        upper = xs;
      } else {
        if (b < a) {
          tmp = b;
          b = a;
          a = tmp;
          tmp = q;
          q = p;
          p = tmp;
          invert = !invert;
        }
        if (pow(p, 1 / a) < 0.5) {
          x = pow(p * a * beta(a, b), 1 / a);
          if (x === 0) {
            x = FLOAT64_MIN_NORM;
          }
          y = 1 - x;
        } else {
          y = pow(1 - pow(p, b * beta(a, b)), 1 / b);
          if (y === 0) {
            y = FLOAT64_MIN_NORM;
          }
          x = 1 - y;
        }
      }
      if (x > 0.5) {
        tmp = b;
        b = a;
        a = tmp;
        tmp = q;
        q = p;
        p = tmp;
        tmp = y;
        y = x;
        x = tmp;
        invert = !invert;
        l = 1 - upper;
        u = 1 - lower;
        lower = l;
        upper = u;
      }
      if (lower === 0) {
        if (invert) {
          lower = EPSILON;
          if (x < lower) {
            x = lower;
          }
        } else {
          lower = FLOAT64_MIN_NORM;
        }
        if (x < lower) {
          x = lower;
        }
      }
      digits = DIGITS;
      if (x < 1e-50 && (a < 1 || b < 1)) {
        digits *= 3;
        digits /= 2;
      }
      roots = ibetaRoots(a, b, p < q ? p : q, p >= q);
      x = halleyIterate(roots, x, lower, upper, digits, MAX_ITERATIONS);
      if (x === lower) {
        x = 0;
      }
      if (invert) {
        return [1 - x, x];
      }
      return [x, 1 - x];
    }
    module.exports = ibetaInvImp;
  }
});

// node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/index.js
var require_lib138 = __commonJS({
  "node_modules/@stdlib/math-base-special-kernel-betaincinv/lib/index.js"(exports, module) {
    "use strict";
    var main2 = require_main96();
    module.exports = main2;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/main.js
var require_main97 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/main.js"(exports, module) {
    "use strict";
    var kernelBetaincinv = require_lib138();
    var isnan = require_lib6();
    var sign = require_lib133();
    var sqrt = require_lib54();
    function quantile(p, v) {
      var prob;
      var xs;
      if (isnan(v) || isnan(p) || v <= 0 || p < 0 || p > 1) {
        return NaN;
      }
      prob = p > 0.5 ? 1 - p : p;
      xs = kernelBetaincinv(v / 2, 0.5, 2 * prob, 1 - 2 * prob);
      return sign(p - 0.5) * sqrt(v * xs[1] / xs[0]);
    }
    module.exports = quantile;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/factory.js
var require_factory7 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/factory.js"(exports, module) {
    "use strict";
    var constantFunction = require_lib55();
    var kernelBetaincinv = require_lib138();
    var isnan = require_lib6();
    var sign = require_lib133();
    var sqrt = require_lib54();
    function factory(v) {
      if (isnan(v) || v <= 0) {
        return constantFunction(NaN);
      }
      return quantile;
      function quantile(p) {
        var prob;
        var xs;
        if (isnan(p) || p < 0 || p > 1) {
          return NaN;
        }
        prob = p > 0.5 ? 1 - p : p;
        xs = kernelBetaincinv(v / 2, 0.5, 2 * prob, 1 - 2 * prob);
        return sign(p - 0.5) * sqrt(v * xs[1] / xs[0]);
      }
    }
    module.exports = factory;
  }
});

// node_modules/@stdlib/stats-base-dists-t-quantile/lib/index.js
var require_lib139 = __commonJS({
  "node_modules/@stdlib/stats-base-dists-t-quantile/lib/index.js"(exports, module) {
    "use strict";
    var setReadOnly = require_lib5();
    var main2 = require_main97();
    var factory = require_factory7();
    setReadOnly(main2, "factory", factory);
    module.exports = main2;
  }
});

// src/cli/main.ts
import { writeFile } from "node:fs/promises";

// src/core/inputError.ts
var InputError = class extends Error {
  location;
  constructor(message, location = {}) {
    super(message);
    this.name = "InputError";
    this.location = location;
  }
  /**
   * One line: "file:line: message (column "c", value "v")". Everything echoed from the input
   * (file and column names, values, and whatever the message quotes, such as a series name) is
   * passed through `printable`, so the line cannot be broken into several, and a name cannot
   * start a line that the Actions runner would read as a workflow command (`::error::…`).
   */
  describe() {
    const { file, line, column, value } = this.location;
    const where = file === void 0 ? "" : line === void 0 ? `${file}: ` : `${file}:${line}: `;
    const details = [];
    if (column !== void 0) details.push(`column "${column}"`);
    if (value !== void 0) details.push(`value ${JSON.stringify(truncate(value, 80))}`);
    return printable(
      `${where}${this.message}${details.length > 0 ? ` (${details.join(", ")})` : ""}`
    );
  }
};
function printable(text) {
  return text.replace(
    // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are the target
    /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g,
    (ch) => ch === "\n" ? "\\n" : ch === "\r" ? "\\r" : ch === "	" ? "\\t" : `\\u{${ch.codePointAt(0)?.toString(16).toUpperCase().padStart(4, "0")}}`
  );
}
function truncate(text, max) {
  return text.length <= max ? text : `${text.slice(0, max)}\u2026`;
}

// src/reading/numbers.ts
function parseDecimal(text) {
  const n = text.length;
  if (n === 0) return Number.NaN;
  if (n <= 17) {
    let i = 0;
    let c = text.charCodeAt(0);
    const negative = c === 45;
    if (negative || c === 43) i = 1;
    let mantissa = 0;
    let digits = 0;
    let scale = -1;
    for (; i < n; i++) {
      c = text.charCodeAt(i);
      if (c >= 48 && c <= 57) {
        mantissa = mantissa * 10 + (c - 48);
        digits++;
      } else if (c === 46 && scale < 0) {
        scale = i;
      } else break;
    }
    if (i === n && digits > 0 && digits <= 15) {
      const fraction = scale < 0 ? 0 : n - 1 - scale;
      const value2 = fraction === 0 ? mantissa : mantissa / POWERS_OF_TEN[fraction];
      return negative ? -value2 : value2;
    }
  }
  const first = text.charCodeAt(0);
  if (!(isDigit(first) || first === 45 || first === 43 || first === 46))
    return Number.NaN;
  const last = text.charCodeAt(n - 1);
  if (!(isDigit(last) || last === 46)) return Number.NaN;
  if (first === 48 && n > 2) {
    const second = text.charCodeAt(1) | 32;
    if (second === 120 || second === 98 || second === 111) return Number.NaN;
  }
  const value = +text;
  return Number.isFinite(value) ? value : Number.NaN;
}
var POWERS_OF_TEN = [
  1,
  10,
  100,
  1e3,
  1e4,
  1e5,
  1e6,
  1e7,
  1e8,
  1e9,
  1e10,
  1e11,
  1e12,
  1e13,
  1e14,
  1e15
];
function isDigit(code) {
  return code >= 48 && code <= 57;
}
function parseHorizon(text) {
  const n = text.length;
  if (n > 0 && n <= 9) {
    let value2 = 0;
    let i = 0;
    for (; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c < 48 || c > 57) break;
      value2 = value2 * 10 + (c - 48);
    }
    if (i === n) return value2 >= 1 ? value2 : 0;
  }
  const value = parseDecimal(text);
  return Number.isInteger(value) && value >= 1 && value <= 2147483647 ? value : 0;
}

// src/alignment/keyOrder.ts
function sortByKey(size, components) {
  let order = new Int32Array(size);
  for (let i = 0; i < size; i++) order[i] = i;
  let sorted = true;
  for (let i = 1; i < size && sorted; i++)
    sorted = compareKeys(components, i - 1, components, i) <= 0;
  if (sorted) return order;
  let next = new Int32Array(size);
  for (let c = components.length - 1; c >= 0; c--) {
    const { values, cardinality } = components[c];
    if (cardinality <= 1) continue;
    const starts = new Int32Array(cardinality + 1);
    for (let i = 0; i < size; i++) starts[values[i] + 1]++;
    for (let v = 0; v < cardinality; v++) starts[v + 1] += starts[v];
    for (let i = 0; i < size; i++) {
      const row = order[i];
      next[starts[values[row]]++] = row;
    }
    const swap = order;
    order = next;
    next = swap;
  }
  return order;
}
function compareKeys(components, a, other, b, depth = components.length) {
  for (let c = 0; c < depth; c++) {
    const d = components[c].values[a] - other[c].values[b];
    if (d !== 0) return d;
  }
  return 0;
}

// src/alignment/timeOrder.ts
var DATE_PREFIX = /^\d{4}-\d{2}-\d{2}/;
var ISO = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,9}))?)?(Z|[+-]\d{2}:\d{2})?)?$/;
function readLabel(label) {
  const number = parseDecimal(label);
  if (!Number.isNaN(number)) return { kind: "number", key: number === 0 ? 0 : number };
  if (!DATE_PREFIX.test(label)) return { kind: "text" };
  const m = ISO.exec(label);
  if (m === null) {
    return "starts like a date but is not YYYY-MM-DD[THH:MM[:SS[.fff]]][Z|\xB1HH:MM]";
  }
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const hour = m[4] === void 0 ? 0 : Number(m[4]);
  const minute = m[5] === void 0 ? 0 : Number(m[5]);
  const second = m[6] === void 0 ? 0 : Number(m[6]);
  const nanos = m[7] === void 0 ? 0 : Number(m[7].padEnd(9, "0"));
  if (month < 1 || month > 12) return `month ${m[2]} is not 01\u201312`;
  if (day < 1 || day > daysInMonth(year, month))
    return `day ${m[3]} does not exist in ${m[1]}-${m[2]}`;
  if (hour > 23) return `hour ${m[4]} is not 00\u201323`;
  if (minute > 59) return `minute ${m[5]} is not 00\u201359`;
  if (second > 59) return `second ${m[6]} is not 00\u201359`;
  let offsetSeconds = 0;
  const zone = m[8];
  if (zone !== void 0 && zone !== "Z") {
    const oh = Number(zone.slice(1, 3));
    const om = Number(zone.slice(4, 6));
    if (oh > 23 || om > 59) return `offset ${zone} is not a valid \xB1HH:MM`;
    offsetSeconds = (zone[0] === "-" ? -1 : 1) * (oh * 3600 + om * 60);
  }
  const seconds = daysFromCivil(year, month, day) * 86400 + hour * 3600 + minute * 60 + second - offsetSeconds;
  const key = `${String(seconds + 1e12).padStart(13, "0")}.${String(nanos).padStart(9, "0")}`;
  return { kind: "datetime", key };
}
function daysInMonth(year, month) {
  if (month === 2) return year % 4 === 0 && year % 100 !== 0 || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}
function daysFromCivil(year, month, day) {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = Math.floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}
function orderLabels(sources, what) {
  const readings = /* @__PURE__ */ new Map();
  const example = { number: "", datetime: "", text: "" };
  const exampleFile = { number: "", datetime: "", text: "" };
  const counts = { number: 0, datetime: 0, text: 0 };
  for (const { file, column } of sources) {
    column.labels.forEach((label, id) => {
      if (readings.has(label)) return;
      const reading = readLabel(label);
      if (typeof reading === "string") {
        throw new InputError(`not a valid ISO 8601 ${what}: ${reading}`, {
          file,
          line: column.firstLines[id],
          column: column.column,
          value: label
        });
      }
      readings.set(label, reading);
      const kind2 = reading.kind;
      counts[kind2]++;
      if (counts[kind2] === 1 || label < example[kind2]) {
        example[kind2] = label;
        exampleFile[kind2] = file;
      }
    });
  }
  const total = readings.size;
  let kind;
  let reason;
  const eg = (k) => `${JSON.stringify(example[k])} in ${exampleFile[k]}`;
  if (counts.number === total) {
    kind = "number";
    reason = `every ${what} is a decimal number: numeric order`;
  } else if (counts.datetime === total) {
    kind = "datetime";
    reason = `every ${what} is an ISO 8601 date or date-time: chronological order (no offset means UTC)`;
  } else {
    kind = "text";
    reason = counts.text > 0 ? `text order: ${eg("text")} is neither a decimal number nor an ISO 8601 date/time` : `text order: the ${what}s mix numbers (e.g. ${eg("number")}) and dates (e.g. ${eg("datetime")})`;
  }
  const keyOf = (label) => {
    const reading = readings.get(label);
    if (kind === "text" || reading.kind === "text") return label;
    return reading.key;
  };
  const representative = /* @__PURE__ */ new Map();
  for (const label of readings.keys()) {
    const key = keyOf(label);
    const current = representative.get(key);
    if (current === void 0 || label < current) representative.set(key, label);
  }
  const keys = [...representative.keys()];
  if (kind === "number") keys.sort((a, b) => a - b);
  else keys.sort(compareCodeUnits);
  const rankOfKey = /* @__PURE__ */ new Map();
  keys.forEach((key, rank) => {
    rankOfKey.set(key, rank);
  });
  const ranks = sources.map(
    ({ column }) => Int32Array.from(column.labels, (label) => rankOfKey.get(keyOf(label)))
  );
  return { kind, reason, ranks, labels: keys.map((key) => representative.get(key)) };
}
function compareCodeUnits(a, b) {
  return a < b ? -1 : a > b ? 1 : 0;
}

// src/alignment/alignPanel.ts
var EXAMPLES = 5;
function alignPanel(input, hooks = {}) {
  const { baseline, candidate, actuals } = input;
  const progress = hooks.onProgress ?? (() => {
  });
  const bFile = baseline.summary.path;
  const cFile = candidate.summary.path;
  checkSameShape(baseline, candidate, "series", (t) => t.series);
  checkSameShape(baseline, candidate, "origin", (t) => t.origin);
  checkSameShape(baseline, candidate, "path", (t) => t.path);
  if (actuals !== void 0) checkSameShape(baseline, actuals, "series", (t) => t.series);
  const tables = actuals === void 0 ? [baseline, candidate] : [baseline, candidate, actuals];
  const series = orderSeries(tables.map((t) => t.series));
  const time = orderLabels(
    tables.map((t) => ({ file: t.summary.path, column: t.timestamp })),
    "timestamp"
  );
  const hasOrigin = baseline.origin !== null;
  const origin = hasOrigin ? orderLabels(
    [baseline, candidate].map((t) => ({ file: t.summary.path, column: t.origin })),
    "origin"
  ) : null;
  const hasPath = baseline.path !== null;
  const path = hasPath ? orderPaths([baseline.path, candidate.path]) : null;
  const originAt = 3;
  const pathAt = hasOrigin ? 4 : 3;
  const horizons = orderHorizons([baseline, candidate]);
  progress(0.1);
  const keysOf = (table, index, withHorizon) => {
    const n = table.size;
    const components = [
      { values: mapIds(table.series, series.ids[index], n), cardinality: series.names.length },
      {
        values: mapIds(table.timestamp, time.ranks[index], n),
        cardinality: time.labels.length
      }
    ];
    if (withHorizon) {
      const values = new Int32Array(n);
      const h = table.horizon?.values;
      if (h === void 0) values.fill(horizons.rankOf(1));
      else for (let i = 0; i < n; i++) values[i] = horizons.rankOf(h[i]);
      components.push({ values, cardinality: horizons.values.length });
      if (origin !== null) {
        components.push({
          values: mapIds(table.origin, origin.ranks[index], n),
          cardinality: origin.labels.length
        });
      }
      if (path !== null) {
        components.push({
          values: mapIds(table.path, path.ids[index], n),
          cardinality: path.names.length
        });
      }
    }
    return components;
  };
  const bKeys = keysOf(baseline, 0, true);
  const cKeys = keysOf(candidate, 1, true);
  progress(0.2);
  const bOrder = sortByKey(baseline.size, bKeys);
  progress(0.3);
  const cOrder = sortByKey(candidate.size, cKeys);
  progress(0.4);
  const describeKey = (keys, row, depth = keys.length) => {
    const parts = [];
    if (baseline.series !== null) parts.push(`series=${series.names[keys[0].values[row]]}`);
    parts.push(`timestamp=${time.labels[keys[1].values[row]]}`);
    if (depth > 2) parts.push(`horizon=${horizons.values[keys[2].values[row]]}`);
    if (depth > originAt && origin !== null) {
      parts.push(`origin=${origin.labels[keys[originAt].values[row]]}`);
    }
    if (depth > pathAt && path !== null) {
      parts.push(`path=${path.names[keys[pathAt].values[row]]}`);
    }
    return parts.join(" ");
  };
  const checkDuplicates = (table, keys, order) => {
    for (let i = 1; i < order.length; i++) {
      const a = order[i - 1];
      const b = order[i];
      if (compareKeys(keys, a, keys, b) === 0) {
        const first = Math.min(table.lines[a], table.lines[b]);
        const second = Math.max(table.lines[a], table.lines[b]);
        throw new InputError(
          `duplicated key ${describeKey(keys, a)}: lines ${first} and ${second} have the same key`,
          { file: table.summary.path, line: second, value: describeKey(keys, b) }
        );
      }
    }
  };
  checkDuplicates(baseline, bKeys, bOrder);
  checkDuplicates(candidate, cKeys, cOrder);
  progress(0.5);
  let pairs = new Int32Array(Math.min(baseline.size, candidate.size) * 2);
  let matched = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const examples = { baselineOnly: [], candidateOnly: [] };
  {
    let i = 0;
    let j = 0;
    while (i < bOrder.length || j < cOrder.length) {
      const c = i >= bOrder.length ? 1 : j >= cOrder.length ? -1 : compareKeys(bKeys, bOrder[i], cKeys, cOrder[j]);
      if (c === 0) {
        pairs[2 * matched] = bOrder[i++];
        pairs[2 * matched + 1] = cOrder[j++];
        matched++;
      } else if (c < 0) {
        if (baselineOnly++ < EXAMPLES) examples.baselineOnly.push(describeKey(bKeys, bOrder[i]));
        i++;
      } else {
        if (candidateOnly++ < EXAMPLES) {
          examples.candidateOnly.push(describeKey(cKeys, cOrder[j]));
        }
        j++;
      }
    }
  }
  if (matched === 0) {
    const eg = (list) => list.length > 0 ? ` (e.g. ${list[0]})` : "";
    throw new InputError(
      `${bFile} and ${cFile} have no key (series, timestamp, horizon${hasOrigin ? ", origin" : ""}${hasPath ? ", path" : ""}) in common: ${baseline.size} baseline rows${eg(examples.baselineOnly)}, ${candidate.size} candidate rows${eg(examples.candidateOnly)}`,
      { file: cFile }
    );
  }
  progress(0.6);
  const actualRow = new Int32Array(matched).fill(-1);
  let withoutActual = 0;
  let actualsUnused = 0;
  const withoutActualExamples = [];
  if (actuals !== void 0) {
    const aKeys = keysOf(actuals, 2, false);
    const aOrder = sortByKey(actuals.size, aKeys);
    checkDuplicates(actuals, aKeys, aOrder);
    const used = new Uint8Array(actuals.size);
    let k = 0;
    for (let m = 0; m < matched; m++) {
      const b = pairs[2 * m];
      let c = 1;
      while (k < aOrder.length) {
        c = compareKeys(bKeys, b, aKeys, aOrder[k], 2);
        if (c <= 0) break;
        k++;
      }
      if (k < aOrder.length && c === 0) {
        actualRow[m] = aOrder[k];
        used[aOrder[k]] = 1;
      } else {
        withoutActual++;
        if (withoutActualExamples.length < EXAMPLES) {
          withoutActualExamples.push(describeKey(bKeys, b));
        }
      }
    }
    for (let r = 0; r < actuals.size; r++) if (used[r] === 0) actualsUnused++;
  } else {
    for (const table of [baseline, candidate]) {
      if (table.actual === null) {
        throw new InputError(
          `no actual column and no separate actuals file: each predictions file must then carry the actual values`,
          { file: table.summary.path, line: 1, column: "actual" }
        );
      }
    }
  }
  const size = matched - withoutActual;
  if (size === 0) {
    throw new InputError(
      `none of the ${matched} keys common to ${bFile} and ${cFile} has an actual value in this file`,
      { file: actuals.summary.path }
    );
  }
  const bRows = new Int32Array(size);
  const cRows = new Int32Array(size);
  const aRows = new Int32Array(size);
  {
    let p = 0;
    for (let m = 0; m < matched; m++) {
      if (actuals !== void 0 && actualRow[m] === -1) continue;
      bRows[p] = pairs[2 * m];
      cRows[p] = pairs[2 * m + 1];
      aRows[p] = actualRow[m];
      p++;
    }
  }
  pairs = new Int32Array(0);
  progress(0.7);
  const describeRow = (p) => describeKey(bKeys, bRows[p]);
  const sources = (pick) => {
    const list = [];
    if (actuals !== void 0) {
      const column = pick(actuals);
      if (column !== null) list.push({ table: actuals, column, rows: aRows });
    }
    const bc = pick(baseline);
    if (bc !== null) list.push({ table: baseline, column: bc, rows: bRows });
    const cc = pick(candidate);
    if (cc !== null) list.push({ table: candidate, column: cc, rows: cRows });
    return list;
  };
  const actualSources = sources((t) => t.actual);
  const actual = agreedValues(actualSources, size, "actual", describeRow);
  const weightSources = sources((t) => t.weight);
  let weight = null;
  if (weightSources.length > 0) {
    const fromActuals = actuals !== void 0 && actuals.weight !== null;
    if (!fromActuals && weightSources.length === 1) {
      const only = weightSources[0].table;
      const other = only === baseline ? candidate : baseline;
      throw new InputError(
        `only this file has a weight column (${other.summary.path} has none); weights must come from the actuals file or from both predictions files`,
        { file: only.summary.path, line: 1, column: weightSources[0].column.column }
      );
    }
    weight = agreedValues(weightSources, size, "weight", describeRow);
  }
  progress(0.8);
  const bLevels = baseline.quantiles.map((q) => q.level);
  const cLevels = candidate.quantiles.map((q) => q.level);
  const common = bLevels.filter((l) => cLevels.includes(l));
  const bothPredict = baseline.prediction !== null && candidate.prediction !== null;
  if (!bothPredict && common.length === 0) {
    const offer = (t) => [
      t.prediction === null ? "" : `point forecasts ("${t.prediction.column}")`,
      t.quantiles.length === 0 ? "" : `quantiles ${t.quantiles.map((q) => q.column).join(", ")}`
    ].filter((s) => s !== "").join(" and ");
    throw new InputError(
      `nothing to compare: ${bFile} has ${offer(baseline)}, ${cFile} has ${offer(candidate)}`,
      { file: cFile, line: 1 }
    );
  }
  const forecasts = (table, rows) => ({
    prediction: bothPredict ? gather(table.prediction.values, rows) : null,
    quantiles: table.quantiles.filter((q) => common.includes(q.level)).map(
      (q) => ({
        level: q.level,
        column: q.column,
        values: gather(q.values, rows)
      })
    )
  });
  const seriesIds = compact(gather32(bKeys[0].values, bRows), series.names);
  const timeIds = compact(gather32(bKeys[1].values, bRows), time.labels);
  const horizon = new Int32Array(size);
  for (let p = 0; p < size; p++) horizon[p] = horizons.values[bKeys[2].values[bRows[p]]];
  const originIds = origin === null ? null : compact(gather32(bKeys[originAt].values, bRows), origin.labels);
  const pathIds = path === null ? null : compact(gather32(bKeys[pathAt].values, bRows), path.names);
  progress(1);
  return {
    size,
    series: seriesIds.ids,
    seriesNames: seriesIds.names,
    time: timeIds.ids,
    timestamps: timeIds.names,
    timestampKind: time.kind,
    timestampKindReason: time.reason,
    horizon,
    origin: originIds === null ? null : originIds.ids,
    origins: originIds === null ? [] : originIds.names,
    originKind: origin === null ? "text" : origin.kind,
    path: pathIds === null ? null : pathIds.ids,
    paths: pathIds === null ? [] : pathIds.names,
    actual,
    actualSource: actuals === void 0 ? { file: bFile, lines: gather32(baseline.lines, bRows) } : { file: actuals.summary.path, lines: gather32(actuals.lines, aRows) },
    baseline: forecasts(baseline, bRows),
    candidate: forecasts(candidate, cRows),
    weight,
    quantileLevels: {
      common,
      baselineOnly: bLevels.filter((l) => !cLevels.includes(l)),
      candidateOnly: cLevels.filter((l) => !bLevels.includes(l))
    },
    coverage: {
      files: tables.map((t) => t.summary),
      rowsMatched: size,
      baselineOnly,
      candidateOnly,
      withoutActual,
      actualsUnused,
      examples: { ...examples, withoutActual: withoutActualExamples }
    }
  };
}
function agreedValues(sources, size, what, describeRow) {
  const first = sources[0];
  const values = gather(first.column.values, first.rows);
  for (let s = 1; s < sources.length; s++) {
    const other = sources[s];
    const v = other.column.values;
    const rows = other.rows;
    for (let p = 0; p < size; p++) {
      const mine = v[rows[p]];
      const theirs = values[p];
      if (mine !== theirs) {
        const line = other.table.lines[rows[p]];
        const firstLine = first.table.lines[first.rows[p]];
        throw new InputError(
          `the ${what} differs between files for ${describeRow(p)}: ${theirs} in ${first.table.summary.path} line ${firstLine}, ${mine} in ${other.table.summary.path} line ${line}`,
          {
            file: other.table.summary.path,
            line,
            column: other.column.column,
            value: String(mine)
          }
        );
      }
    }
  }
  return values;
}
function checkSameShape(a, b, what, pick) {
  const ca = pick(a);
  const cb = pick(b);
  if (ca === null === (cb === null)) return;
  const [has, lacks] = ca === null ? [b, a] : [a, b];
  const column = pick(has).column;
  throw new InputError(
    `this file has no ${what} column but ${has.summary.path} has one ("${column}"), so their keys cannot match`,
    { file: lacks.summary.path, line: 1, column }
  );
}
function orderSeries(columns) {
  const all = /* @__PURE__ */ new Set();
  for (const column of columns) for (const label of column?.labels ?? [""]) all.add(label);
  return numberLabels(columns, [...all].sort(compareCodeUnits));
}
function orderPaths(columns) {
  const all = /* @__PURE__ */ new Set();
  for (const column of columns) for (const label of column.labels) all.add(label);
  const names = [...all];
  const values = /* @__PURE__ */ new Map();
  for (const name of names) values.set(name, parseDecimal(name));
  const numeric = names.every((name) => !Number.isNaN(values.get(name)));
  names.sort(
    numeric ? (a, b) => values.get(a) - values.get(b) || compareCodeUnits(a, b) : compareCodeUnits
  );
  return numberLabels(columns, names);
}
function numberLabels(columns, names) {
  const index = /* @__PURE__ */ new Map();
  names.forEach((name, id) => {
    index.set(name, id);
  });
  const ids = columns.map(
    (column) => Int32Array.from(column?.labels ?? [""], (label) => index.get(label))
  );
  return { names, ids };
}
function orderHorizons(tables) {
  let max = 1;
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h !== void 0) {
      for (let i = 0; i < h.length; i++) if (h[i] > max) max = h[i];
    }
  }
  if (max <= 1 << 16) {
    const rank2 = new Int32Array(max + 1).fill(-1);
    for (const table of tables) {
      const h = table.horizon?.values;
      if (h === void 0) rank2[1] = 0;
      else for (let i = 0; i < h.length; i++) rank2[h[i]] = 0;
    }
    const values2 = [];
    for (let v = 1; v <= max; v++) if (rank2[v] === 0) rank2[v] = values2.push(v) - 1;
    return { values: values2, rankOf: (horizon) => rank2[horizon] };
  }
  const seen = /* @__PURE__ */ new Set();
  for (const table of tables) {
    const h = table.horizon?.values;
    if (h === void 0) seen.add(1);
    else for (let i = 0; i < h.length; i++) seen.add(h[i]);
  }
  const values = [...seen].sort((a, b) => a - b);
  const rank = /* @__PURE__ */ new Map();
  values.forEach((v, r) => {
    rank.set(v, r);
  });
  return { values, rankOf: (horizon) => rank.get(horizon) };
}
function mapIds(column, map, n) {
  const out = new Int32Array(n);
  if (column === null) return out.fill(map[0]);
  const ids = column.ids;
  for (let i = 0; i < n; i++) out[i] = map[ids[i]];
  return out;
}
function gather(values, rows) {
  const out = new Float64Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]];
  return out;
}
function gather32(values, rows) {
  const out = new Int32Array(rows.length);
  for (let p = 0; p < rows.length; p++) out[p] = values[rows[p]];
  return out;
}
function compact(ids, names) {
  const remap = new Int32Array(names.length).fill(-1);
  for (let p = 0; p < ids.length; p++) remap[ids[p]] = 0;
  const kept = [];
  for (let id = 0; id < names.length; id++) {
    if (remap[id] === 0) {
      remap[id] = kept.length;
      kept.push(names[id]);
    }
  }
  for (let p = 0; p < ids.length; p++) ids[p] = remap[ids[p]];
  return { ids, names: kept };
}

// src/alignment/historyBySeries.ts
function historyBySeries(table) {
  const order = orderLabels([{ file: table.summary.path, column: table.timestamp }], "timestamp");
  const ranks = order.ranks[0];
  const actual = table.actual?.values ?? new Float64Array(table.size);
  const bySeries = /* @__PURE__ */ new Map();
  for (let i = 0; i < table.size; i++) {
    const name = table.series === null ? "" : table.series.labels[table.series.ids[i]];
    let list = bySeries.get(name);
    if (list === void 0) {
      list = [];
      bySeries.set(name, list);
    }
    list.push({ rank: ranks[table.timestamp.ids[i]], value: actual[i] });
  }
  const out = /* @__PURE__ */ new Map();
  for (const [name, list] of bySeries) {
    list.sort((a, b) => a.rank - b.rank);
    out.set(
      name,
      Float64Array.from(list, (p) => p.value)
    );
  }
  return out;
}

// src/alignment/orderLossSeries.ts
function orderLossSeries(table) {
  const file = table.summary.path;
  const order = orderLabels([{ file, column: table.timestamp }], "timestamp");
  const ranks = order.ranks[0];
  const n = table.size;
  const rowAt = new Int32Array(order.labels.length).fill(-1);
  for (let i = 0; i < n; i++) {
    const rank = ranks[table.timestamp.ids[i]];
    const other = rowAt[rank];
    if (other >= 0) {
      throw new InputError(
        `this timestamp denotes the same time as line ${table.lines[other]} (${JSON.stringify(
          table.timestamp.labels[table.timestamp.ids[other]]
        )})`,
        {
          file,
          line: table.lines[i],
          column: table.timestamp.column,
          value: table.timestamp.labels[table.timestamp.ids[i]]
        }
      );
    }
    rowAt[rank] = i;
  }
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rows = new Int32Array(n);
  let k = 0;
  let rowCount = 0;
  let maxHorizon = 1;
  for (let rank = 0; rank < rowAt.length; rank++) {
    const i = rowAt[rank];
    if (i < 0) continue;
    time[k] = rank;
    baseline[k] = table.baseline[i];
    candidate[k] = table.candidate[i];
    rows[k] = table.rows[i];
    rowCount += table.rows[i];
    maxHorizon = Math.max(maxHorizon, table.horizon[i]);
    k++;
  }
  return {
    series: { time, baseline, candidate, rows, rowCount, maxHorizon },
    timestamps: [...order.labels],
    kind: order.kind,
    reason: order.reason
  };
}

// src/core/version.ts
var VERSION = "0.1.0";

// src/decision/hypothesis.ts
function hypothesisFor(policy, margin, kind) {
  const better = policy === "superiority";
  const signed = better ? -margin : margin;
  const marginText = margin === 0 ? "" : kind === "relative" ? ` by more than ${formatPercent(margin)}` : ` by more than ${margin} loss units`;
  const base = {
    baselineFactor: kind === "relative" ? 1 + signed : 1,
    boundary: kind === "relative" ? 0 : signed
  };
  switch (policy) {
    case "no-regression":
      return {
        ...base,
        rejectWhen: "above",
        onReject: "fail",
        nullHypothesis: `the candidate's expected loss is not higher than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is higher than the baseline's${marginText}`
      };
    case "non-inferiority":
      return {
        ...base,
        rejectWhen: "below",
        onReject: "pass",
        nullHypothesis: margin === 0 ? "the candidate's expected loss is at least the baseline's" : `the candidate is worse than the baseline by ${describeMargin(margin, kind)} or more`,
        alternative: margin === 0 ? "the candidate's expected loss is lower than the baseline's" : `the candidate is not worse than the baseline by ${describeMargin(margin, kind)} or more`
      };
    case "superiority":
      return {
        ...base,
        rejectWhen: "below",
        onReject: "pass",
        nullHypothesis: `the candidate's expected loss is not lower than the baseline's${marginText}`,
        alternative: `the candidate's expected loss is lower than the baseline's${marginText}`
      };
  }
}
function describeMargin(margin, kind) {
  return kind === "relative" ? formatPercent(margin) : `${margin} loss units`;
}
function formatPercent(fraction) {
  return `${Number((fraction * 100).toPrecision(6))}%`;
}

// src/decision/verdict.ts
function worstVerdict(verdicts) {
  if (verdicts.includes("fail")) return "fail";
  if (verdicts.includes("warn")) return "warn";
  return "pass";
}

// src/integrity/checkResult.ts
var CHECK_IDS = [
  "look-ahead",
  "horizon-steps",
  "origin-after-actuals",
  "origin-sets",
  "path-sets",
  "horizon-sets",
  "time-spans",
  "series-coverage",
  "fold-purge",
  "outside-test-window",
  "exact-predictions"
];
var FAILING_CHECKS = ["look-ahead", "outside-test-window"];
var MAX_EXAMPLES = 5;
var FindingCollector = class {
  count = 0;
  examples = [];
  add(example) {
    if (this.count++ < MAX_EXAMPLES) this.examples.push(example());
  }
};

// src/integrity/checkPolicy.ts
function applyCheckPolicy(findings, notRun, mode, frequency) {
  const checks = findings.map((f) => ({
    id: f.id,
    status: statusOf(f, mode),
    count: f.count,
    examples: f.examples,
    summary: f.summary
  }));
  const outcome = checks.some((c) => c.status === "fail") ? "fail" : checks.some((c) => c.status === "warn") ? "warn" : "ok";
  return { mode, outcome, affectsVerdict: mode !== "report", frequency, checks, notRun };
}
function statusOf(f, mode) {
  if (f.count === 0) return "ok";
  return mode === "enforce" && FAILING_CHECKS.includes(f.id) ? "fail" : "warn";
}
function noChecks(mode, reason) {
  return {
    mode,
    outcome: "ok",
    affectsVerdict: mode !== "report",
    frequency: null,
    checks: [],
    notRun: CHECK_IDS.map((id) => ({ id, reason }))
  };
}

// src/core/formatNumber.ts
function formatNumber(x, digits = 4) {
  if (x === null || x === void 0 || !Number.isFinite(x)) return "n/a";
  if (x === 0) return "0";
  const magnitude = Math.abs(x);
  if (magnitude >= 1e6 || magnitude < 1e-4) return x.toExponential(digits - 1);
  return String(Number(x.toPrecision(digits)));
}
function formatSignedPercent(x) {
  if (x === null || x === void 0 || !Number.isFinite(x)) return "n/a";
  const text = formatNumber(x * 100, 3);
  return `${x > 0 ? "+" : ""}${text}%`;
}
function formatPValue(p) {
  if (p === null || p === void 0 || !Number.isFinite(p)) return "n/a";
  return p < 1e-4 ? "< 0.0001" : p.toFixed(4);
}

// src/settings/defaultConfidence.ts
function defaultConfidence(alpha) {
  return Number((1 - 2 * alpha).toPrecision(15));
}
function confidenceOverridesDefault(confidence, alpha) {
  return confidence !== defaultConfidence(alpha);
}

// src/report/relativeChangeText.ts
function relativeChangeText(c) {
  const rc = c.relativeChange;
  const point = formatSignedPercent(c.relativeDifference);
  if (rc === null) return point;
  const pieces = rc.pieces ?? [{ lower: rc.lower, upper: rc.upper }];
  if (pieces.length === 0) return `${point} \u2205`;
  return `${point} ${pieces.map(pieceText).join(" \u222A ")}`;
}
function pieceText(p) {
  const lower = p.lower === null ? "\u2212\u221E" : formatSignedPercent(p.lower);
  const upper = p.upper === null ? "+\u221E" : formatSignedPercent(p.upper);
  return `[${lower}, ${upper}]`;
}
function intervalNote(report) {
  const { confidence, alpha } = report.settings;
  const pct = `${formatNumber(confidence * 100, 3)}%`;
  if (confidenceOverridesDefault(confidence, alpha)) {
    return `Intervals are ${pct}, set by --confidence instead of the default 1 \u2212 2\u03B1 = ${formatNumber((1 - 2 * alpha) * 100, 3)}%: the intervals and the tests (\u03B1 = ${alpha} each side) may disagree.`;
  }
  return `Intervals are ${pct} (1 \u2212 2\u03B1): each end is a one-sided bound at \u03B1 = ${alpha}. The relative change interval holds the relative margins at which the gate would not reject: a margin below its lower end means evidence of a regression larger than that margin.`;
}

// src/stability/calendarDate.ts
function calendarDateOf(label) {
  const reading = readLabel(label);
  if (typeof reading === "string" || reading.kind !== "datetime") return null;
  const seconds = Number(reading.key.slice(0, 13)) - 1e12;
  const dayNumber = Math.floor(seconds / 86400);
  return { ...civilFromDays(dayNumber), dayNumber };
}
function civilFromDays(days) {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const doe = z - era * 146097;
  const yoe = Math.floor(
    (doe - Math.floor(doe / 1460) + Math.floor(doe / 36524) - Math.floor(doe / 146096)) / 365
  );
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  const day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

// src/stability/describeSpan.ts
function describeSpan(first, last, points, kind) {
  const a = kind === "datetime" ? calendarDateOf(first) : null;
  const b = kind === "datetime" ? calendarDateOf(last) : null;
  if (a !== null && b !== null) {
    const days = b.dayNumber - a.dayNumber + 1;
    if (days >= 90) return plural(Math.round(days / 30.44), "month");
    if (days >= 14) return plural(Math.round(days / 7), "week");
    if (days >= 2) return plural(days, "day");
  }
  return plural(points, "time point");
}
function plural(count, unit) {
  return `${count} ${unit}${count === 1 ? "" : "s"}`;
}

// src/stability/stabilityFinding.ts
function stabilityFinding(stability, hypothesis, settings, kind) {
  if (stability === null) return { effect: null, headline: "", reasons: [] };
  const sentences = [];
  const reasons = [];
  const recent = stability.recent;
  const recentWorse = recent !== null && recent.verdict === "fail";
  if (recent !== null && recentWorse) {
    const where = recentWords(recent, kind);
    const change = changeWords(recent);
    sentences.push(
      hypothesis.onReject === "fail" ? `The candidate is worse in ${where}: ${change}.` : `In ${where} the candidate does not meet the policy: ${change}.`
    );
    reasons.push(
      `Recent window (${recent.n} time points, ${recent.firstTimestamp} to ${recent.lastTimestamp}): ${recent.reasons.join(" ")}`
    );
  }
  const f = stability.fluctuation;
  const stretchWorse = f !== null && f.rejected && f.worsePeriods.length > 0;
  if (f !== null && stretchWorse) {
    const spans = f.worsePeriods.slice(0, 3).map(spanWords).join(", ");
    const more = f.worsePeriods.length > 3 ? ` and ${f.worsePeriods.length - 3} more` : "";
    sentences.push(
      `The difference is not stable over time: significantly worse over ${spans}${more} (fluctuation test, windows of ${f.windowSize} time points, ${formatNumber(f.statistic, 3)} > ${formatNumber(f.criticalValue, 4)}).`
    );
    reasons.push(
      `Fluctuation test (Giacomini & Rossi 2010, \u03BC = ${f.mu}, ${settings.fluctuationSides}-sided, \u03B1 = ${settings.alpha}): the largest rolling statistic ${formatNumber(f.statistic)} exceeds the critical value ${formatNumber(f.criticalValue)}; it peaks over ${spanWords(f.peak)}.`
    );
  }
  if (!recentWorse && !stretchWorse) return { effect: null, headline: "", reasons };
  const gate = settings.stabilityGate;
  const response = gate === "off" ? "This does not change the verdict (stability-gate off)." : gate === "warn" ? "This makes the gate warn; it does not fail it (stability-gate warn)." : "This fails the gate (stability-gate fail).";
  return {
    effect: gate === "off" ? null : gate,
    headline: [...sentences, response].join(" "),
    reasons
  };
}
function recentWords(c, kind) {
  const first = c.firstTimestamp ?? "?";
  const last = c.lastTimestamp ?? "?";
  return `the most recent ${describeSpan(first, last, c.n, kind)} (${first} to ${last})`;
}
function changeWords(c) {
  const rel = c.relativeDifference;
  if (rel === null) {
    return `mean loss ${formatNumber(c.meanCandidateLoss)} vs ${formatNumber(c.meanBaselineLoss)}`;
  }
  const rc = c.relativeChange;
  const shown = `${formatSignedPercent(rel)} mean loss`;
  if (rc === null) return shown;
  const single = rc.pieces === void 0 || rc.pieces.length === 1;
  const level = `${formatNumber(rc.level * 100, 3)}% interval`;
  if (single && rc.lower !== null && rc.upper !== null) {
    return `${shown} (${level} ${formatSignedPercent(rc.lower)} to ${formatSignedPercent(rc.upper)})`;
  }
  return `${shown} (${level} ${relativeChangeText(c).replace(/^\S+ /, "")})`;
}
function spanWords(span) {
  return `${span.start} to ${span.end}`;
}

// src/report/buildReport.ts
function buildReport(parts) {
  const { inputs, settings, hypothesis } = parts;
  const overall = parts.comparisons[0];
  if (overall === void 0) throw new Error("a report needs the overall comparison");
  const reasons = [];
  const verdicts = [overall.verdict];
  const missing = inputs.rowsDropped.baseline;
  if (missing > 0) {
    if (settings.allowMissing) {
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has; allowed by allow-missing, they are left out of the comparison.`
      );
    } else {
      verdicts.push("fail");
      reasons.push(
        `The candidate lacks ${missing} rows that the baseline has. A candidate must not pass by skipping hard cases; set allow-missing to compare on the common rows only.`
      );
    }
  }
  const integrity = parts.integrity ?? noChecks(settings.backtestChecks, "a pre-aggregated loss file has no forecast rows to check");
  if (integrity.affectsVerdict && integrity.outcome !== "ok") {
    verdicts.push(integrity.outcome === "fail" ? "fail" : "warn");
    const which = integrity.checks.filter((c) => c.status === integrity.outcome).map((c) => c.id);
    reasons.push(
      integrity.outcome === "fail" ? `A backtest check failed (${which.join(", ")}): the comparison cannot be trusted until the backtest is fixed.` : `A backtest check warns (${which.join(", ")}): look at the backtest checks before trusting the comparison.`
    );
  }
  const stability = parts.stability ?? null;
  const finding = stabilityFinding(stability, hypothesis, settings, inputs.timestamps.kind);
  reasons.push(...finding.reasons);
  const gateVerdict = worstVerdict(verdicts);
  const verdict = worstVerdict(finding.effect === null ? verdicts : [...verdicts, finding.effect]);
  return {
    tool: { name: "skillgate", version: parts.version },
    name: settings.name,
    verdict,
    headline: [headline(gateVerdict, overall, hypothesis), finding.headline].join(" ").trim(),
    policy: {
      policy: settings.policy,
      agreement: settings.agreement,
      alpha: settings.alpha,
      margin: settings.margin,
      marginKind: settings.marginKind,
      nullHypothesis: hypothesis.nullHypothesis,
      alternative: hypothesis.alternative,
      onReject: hypothesis.onReject,
      baselineFactor: hypothesis.baselineFactor,
      boundary: hypothesis.boundary
    },
    comparisons: parts.comparisons,
    inputs,
    settings,
    reasons,
    seriesSummary: parts.seriesSummary ?? null,
    pathSummary: parts.pathSummary ?? null,
    integrity,
    stability
  };
}
function headline(verdict, overall, hypothesis) {
  const rel = overall.relativeDifference;
  const change = rel === null ? `mean loss ${overall.meanCandidateLoss} vs ${overall.meanBaselineLoss}` : `mean loss ${rel >= 0 ? "up" : "down"} ${Math.abs(rel * 100).toFixed(2)}% against the baseline`;
  const tested = `Tested whether ${hypothesis.alternative}, over ${overall.n} time points (${change}).`;
  switch (verdict) {
    case "pass":
      return `${tested} The gate passes.`;
    case "warn":
      return `${tested} The evidence is mixed or thin: the gate passes with a warning.`;
    case "fail":
      return `${tested} The gate fails.`;
  }
}

// src/report/inputsSummary.ts
function panelInputsSummary(panel, losses) {
  const horizons = /* @__PURE__ */ new Set();
  for (let i = 0; i < panel.size; i++) horizons.add(panel.horizon[i]);
  const ts = panel.timestamps;
  return {
    files: panel.coverage.files,
    rowsMatched: panel.coverage.rowsMatched,
    rowsDropped: {
      baseline: panel.coverage.baselineOnly,
      candidate: panel.coverage.candidateOnly,
      withoutActual: panel.coverage.withoutActual,
      actualsUnused: panel.coverage.actualsUnused,
      skippedByLoss: losses.included === null ? 0 : losses.zeroActualRows.length
    },
    examples: {
      baselineOnly: panel.coverage.examples.baselineOnly,
      candidateOnly: panel.coverage.examples.candidateOnly
    },
    timestamps: {
      count: ts.length,
      kind: panel.timestampKind,
      first: ts[0] ?? null,
      last: ts.at(-1) ?? null
    },
    series: panel.seriesNames.length,
    horizons: [...horizons].sort((a, b) => a - b),
    quantileLevels: losses.levels,
    intervalCoverage: losses.coverage
  };
}
function lossFileInputsSummary(file, timestamps, kind, maxHorizon) {
  return {
    files: [file],
    rowsMatched: file.rows,
    rowsDropped: {
      baseline: 0,
      candidate: 0,
      withoutActual: 0,
      actualsUnused: 0,
      skippedByLoss: 0
    },
    examples: { baselineOnly: [], candidateOnly: [] },
    timestamps: {
      count: timestamps.length,
      kind,
      first: timestamps[0] ?? null,
      last: timestamps.at(-1) ?? null
    },
    series: 1,
    horizons: Array.from({ length: maxHorizon }, (_, i) => i + 1).slice(-1),
    quantileLevels: [],
    intervalCoverage: null
  };
}

// src/aggregation/lossSeries.ts
function aggregateByTime(panel, losses, rows, weights = null) {
  const points = panel.timestamps.length;
  const sumB = new Float64Array(points);
  const sumC = new Float64Array(points);
  const count = new Int32Array(points);
  const weightSum = weights === null ? null : new Float64Array(points);
  let maxHorizon = 1;
  let rowCount = 0;
  const included = losses.included;
  const total = rows === void 0 ? panel.size : rows.length;
  for (let r = 0; r < total; r++) {
    const i = rows === void 0 ? r : rows[r];
    if (included !== null && included[i] === 0) continue;
    const t = panel.time[i];
    const w = weights === null ? 1 : weights[i];
    sumB[t] += w * losses.baseline[i];
    sumC[t] += w * losses.candidate[i];
    if (weightSum !== null) weightSum[t] += w;
    count[t]++;
    rowCount++;
    const h = panel.horizon[i];
    if (h > maxHorizon) maxHorizon = h;
  }
  const denominator = (t) => weightSum === null ? count[t] : weightSum[t];
  let n = 0;
  for (let t = 0; t < points; t++) if (count[t] > 0 && denominator(t) > 0) n++;
  const time = new Int32Array(n);
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const rowsAt = new Int32Array(n);
  let k = 0;
  for (let t = 0; t < points; t++) {
    const m = denominator(t);
    if (count[t] === 0 || m <= 0) continue;
    time[k] = t;
    baseline[k] = sumB[t] / m;
    candidate[k] = sumC[t] / m;
    rowsAt[k] = count[t];
    k++;
  }
  return { time, baseline, candidate, rows: rowsAt, rowCount, maxHorizon };
}
function lossDifferential(series, relativeMargin) {
  const n = series.baseline.length;
  const d = new Float64Array(n);
  const factor = 1 + relativeMargin;
  for (let t = 0; t < n; t++) d[t] = series.candidate[t] - factor * series.baseline[t];
  return d;
}

// src/statistics/mean.ts
function mean(x) {
  const n = x.length;
  if (n === 0) throw new RangeError("mean: the series is empty");
  let sum = 0;
  for (let t = 0; t < n; t++) sum += x[t];
  const first = sum / n;
  let residual = 0;
  for (let t = 0; t < n; t++) residual += x[t] - first;
  return first + residual / n;
}

// src/statistics/autocovariance.ts
function autocovariances(x, maxLag) {
  const n = x.length;
  if (n === 0) throw new RangeError("autocovariances: the series is empty");
  if (!Number.isInteger(maxLag) || maxLag < 0 || maxLag > n - 1) {
    throw new RangeError(
      `autocovariances: maxLag must be an integer in 0..${n - 1}, got ${maxLag}`
    );
  }
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t] - centre;
  const gamma = new Float64Array(maxLag + 1);
  for (let k = 0; k <= maxLag; k++) {
    let sum = 0;
    for (let t = k; t < n; t++) sum += u[t] * u[t - k];
    gamma[k] = sum / n;
  }
  return gamma;
}

// src/statistics/bartlettLongRunVariance.ts
function bartlettLongRunVariance(x, lag) {
  const gamma = autocovariances(x, lag);
  let sum = gamma[0];
  for (let k = 1; k <= lag; k++) sum += 2 * (1 - k / (lag + 1)) * gamma[k];
  return sum;
}

// src/statistics/neweyWestLag.ts
function neweyWestBandwidth(x) {
  const n = x.length;
  if (n < 2) throw new RangeError(`neweyWestBandwidth: needs at least 2 values, got ${n}`);
  const pilotLag = Math.min(Math.floor(4 * (n / 100) ** (2 / 9)), n - 1);
  const sigma = autocovariances(x, pilotLag);
  let sum = 0;
  let weighted = 0;
  for (let j = 1; j <= pilotLag; j++) {
    sum += sigma[j];
    weighted += j * sigma[j];
  }
  const s0 = sigma[0] + 2 * sum;
  const s1 = 2 * weighted;
  const bandwidth = s0 === 0 ? 0 : 1.1447 * ((s1 / s0) ** 2) ** (1 / 3) * n ** (1 / 3);
  return { pilotLag, s0, s1, bandwidth };
}
function selectLag(x, rule, horizon) {
  const n = x.length;
  if (n < 2) throw new RangeError(`selectLag: needs at least 2 values, got ${n}`);
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`selectLag: the horizon must be an integer \u2265 1, got ${horizon}`);
  }
  const notes = [];
  const cap = (lag, what) => {
    if (lag <= n - 1) return lag;
    notes.push(`The ${what} ${lag} exceeds n \u2212 1 = ${n - 1}; lag ${n - 1} was used instead.`);
    return n - 1;
  };
  switch (rule.kind) {
    case "auto": {
      const bandwidth = neweyWestBandwidth(x);
      let lag = Math.floor(bandwidth.bandwidth);
      if (bandwidth.s0 === 0) {
        notes.push("The Newey\u2013West pilot sum s0 is 0, so the automatic bandwidth is taken as 0.");
      }
      if (lag < horizon - 1) {
        notes.push(
          `The automatic lag \u230A${bandwidth.bandwidth.toPrecision(6)}\u230B = ${lag} is below h \u2212 1 = ${horizon - 1} for horizon ${horizon}; lag ${horizon - 1} was used.`
        );
        lag = horizon - 1;
      }
      return { lag: cap(lag, "automatic lag"), rule: "auto", bandwidth, notes };
    }
    case "horizon":
      return { lag: cap(horizon - 1, "lag h \u2212 1 ="), rule: "horizon", notes };
    case "fixed": {
      if (!Number.isInteger(rule.lag) || rule.lag < 0) {
        throw new RangeError(`selectLag: a fixed lag must be an integer \u2265 0, got ${rule.lag}`);
      }
      if (rule.lag < horizon - 1) {
        notes.push(
          `The fixed lag ${rule.lag} is below h \u2212 1 = ${horizon - 1}; h-step forecast errors are usually correlated up to lag h \u2212 1, so the variance may be understated.`
        );
      }
      return { lag: cap(rule.lag, "fixed lag"), rule: "fixed", notes };
    }
  }
}

// src/statistics/prewhitenedLongRunVariance.ts
var PREWHITENING_CAP = 0.97;
function prewhitenedLongRunVariance(y, rule, horizon) {
  const n = y.length;
  if (n < 3) throw new RangeError(`prewhitenedLongRunVariance: needs at least 3 values, got ${n}`);
  const centre = mean(y);
  let cross = 0;
  let square = 0;
  for (let t = 1; t < n; t++) {
    const previous = y[t - 1] - centre;
    cross += (y[t] - centre) * previous;
    square += previous * previous;
  }
  const raw = square === 0 ? 0 : cross / square;
  const coefficient = Math.max(-PREWHITENING_CAP, Math.min(PREWHITENING_CAP, raw));
  const residuals = new Float64Array(n - 1);
  for (let t = 1; t < n; t++) {
    residuals[t - 1] = y[t] - centre - coefficient * (y[t - 1] - centre);
  }
  const lag = selectLag(residuals, rule, horizon).lag;
  const recolour = (1 - coefficient) ** 2;
  return {
    longRunVariance: bartlettLongRunVariance(residuals, lag) / recolour,
    coefficient,
    lag
  };
}

// src/stability/fluctuationCriticalValues.ts
var TABLE_MU = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
var TABLE = {
  two: [
    { alpha: 0.01, values: [3.8733, 3.6919, 3.5621, 3.4441, 3.347, 3.231, 3.133, 3.0092, 2.8685] },
    { alpha: 0.05, values: [3.393, 3.179, 3.012, 2.89, 2.779, 2.634, 2.56, 2.433, 2.248] },
    { alpha: 0.1, values: [3.17, 2.948, 2.766, 2.626, 2.5, 2.356, 2.252, 2.13, 1.95] }
  ],
  one: [
    { alpha: 0.01, values: [3.69, 3.4981, 3.3616, 3.2245, 3.0992, 3.0005, 2.8805, 2.76, 2.6099] },
    { alpha: 0.05, values: [3.176, 2.938, 2.77, 2.624, 2.475, 2.352, 2.248, 2.08, 1.975] },
    { alpha: 0.1, values: [2.928, 2.676, 2.482, 2.334, 2.168, 2.03, 1.904, 1.74, 1.6] }
  ]
};
function fluctuationCriticalValue(mu, alpha, sides) {
  if (!(mu >= 0.1 - 1e-12 && mu <= 0.9 + 1e-12)) return null;
  const columns = TABLE[sides];
  const atAlpha = columns.find((c) => Math.abs(c.alpha - alpha) < 1e-12);
  if (atAlpha !== void 0) return interpolateInMu(atAlpha.values, mu);
  for (let i = 0; i + 1 < columns.length; i++) {
    const lo2 = columns[i];
    const hi2 = columns[i + 1];
    if (alpha > lo2.alpha && alpha < hi2.alpha) {
      const w = Math.log(alpha / lo2.alpha) / Math.log(hi2.alpha / lo2.alpha);
      return (1 - w) * interpolateInMu(lo2.values, mu) + w * interpolateInMu(hi2.values, mu);
    }
  }
  return null;
}
function interpolateInMu(values, mu) {
  const position = Math.min(Math.max((mu - 0.1) / 0.1, 0), TABLE_MU.length - 1);
  const i = Math.min(Math.floor(position + 1e-9), TABLE_MU.length - 2);
  const w = Math.min(Math.max(position - i, 0), 1);
  return (1 - w) * values[i] + w * values[i + 1];
}

// src/stability/rollingStatistic.ts
function rollingStatistic(d, m, longRunVariance) {
  const n = d.length;
  if (!Number.isInteger(m) || m < 1 || m > n) {
    throw new RangeError(`rollingStatistic: window ${m} must be an integer in 1..${n}`);
  }
  if (!(longRunVariance > 0)) {
    throw new RangeError(
      `rollingStatistic: the long-run variance must be > 0, got ${longRunVariance}`
    );
  }
  const scale = 1 / Math.sqrt(m * longRunVariance);
  const out = new Float64Array(n - m + 1);
  let sum = 0;
  for (let k = 0; k <= n - m; k++) {
    if (k % 1024 === 0) {
      sum = 0;
      for (let j = k; j < k + m; j++) sum += d[j];
    } else {
      sum += d[k + m - 1] - d[k - 1];
    }
    out[k] = sum * scale;
  }
  return out;
}

// src/stability/fluctuationTest.ts
var FLUCTUATION_MIN_POINTS = 20;
function fluctuationTest(d, options) {
  const n = d.length;
  if (n < FLUCTUATION_MIN_POINTS) return null;
  const criticalValue = fluctuationCriticalValue(options.mu, options.alpha, options.sides);
  if (criticalValue === null) return null;
  const windowSize = Math.round(options.mu * n);
  if (windowSize < 2) return null;
  const { longRunVariance, lag } = prewhitenedLongRunVariance(d, options.lag, options.horizon);
  if (!(longRunVariance > 0)) return null;
  const path = rollingStatistic(d, windowSize, longRunVariance);
  let peakWindow = 0;
  let statistic = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < path.length; k++) {
    const value = options.sides === "one" ? path[k] : Math.abs(path[k]);
    if (value > statistic) {
      statistic = value;
      peakWindow = k;
    }
  }
  const worseRuns = [];
  for (let k = 0; k < path.length; k++) {
    if (!(path[k] > criticalValue)) continue;
    const from = k;
    const to = k + windowSize - 1;
    const last = worseRuns.at(-1);
    if (last !== void 0 && from <= last[1] + 1) last[1] = to;
    else worseRuns.push([from, to]);
  }
  return {
    statistic,
    criticalValue,
    windowSize,
    rejected: statistic > criticalValue,
    peakWindow,
    worseRuns,
    lag,
    longRunVariance,
    path
  };
}

// src/stability/periodBuckets.ts
var MIN_PERIODS = 8;
var MAX_PERIODS = 60;
var POINTS_PER_BUCKET = 10;
var CALENDAR_UNITS = [
  "day",
  "week",
  "month",
  "quarter"
];
function periodBuckets(labels, kind) {
  const n = labels.length;
  if (kind === "datetime" && n > 0) {
    const dates = labels.map(calendarDateOf);
    if (dates.every((d) => d !== null)) {
      for (const unit of CALENDAR_UNITS) {
        const bounds = calendarBounds(dates, unit);
        const count = bounds.length - 1;
        if (count > MAX_PERIODS) continue;
        if (count >= MIN_PERIODS) return { unit, bounds };
        break;
      }
    }
  }
  return { unit: "equal-count", bounds: equalCountBounds(n) };
}
function calendarKey(date, unit) {
  switch (unit) {
    case "day":
      return date.dayNumber;
    case "week":
      return Math.floor((date.dayNumber + 3) / 7);
    case "month":
      return date.year * 12 + date.month - 1;
    case "quarter":
      return date.year * 4 + Math.floor((date.month - 1) / 3);
  }
}
function calendarBounds(dates, unit) {
  const bounds = [];
  let previous = null;
  dates.forEach((date, t) => {
    const key = calendarKey(date, unit);
    if (key !== previous) bounds.push(t);
    previous = key;
  });
  bounds.push(dates.length);
  return bounds;
}
function equalCountBounds(n) {
  if (n === 0) return [0];
  const k = Math.min(
    n,
    Math.max(MIN_PERIODS, Math.min(MAX_PERIODS, Math.ceil(n / POINTS_PER_BUCKET)))
  );
  const bounds = [];
  for (let j = 0; j <= k; j++) bounds.push(Math.floor(j * n / k));
  return bounds;
}

// src/stability/periodBreakdown.ts
function periodBreakdown(series, timestamps, kind) {
  const labels = Array.from(series.time, (t) => timestamps[t] ?? String(t));
  const buckets = periodBuckets(labels, kind);
  const periods = [];
  for (let j = 0; j + 1 < buckets.bounds.length; j++) {
    const from = buckets.bounds[j];
    const to = buckets.bounds[j + 1];
    if (to <= from) continue;
    const meanBaselineLoss = mean(series.baseline.subarray(from, to));
    const meanCandidateLoss = mean(series.candidate.subarray(from, to));
    periods.push({
      start: labels[from],
      end: labels[to - 1],
      n: to - from,
      meanBaselineLoss,
      meanCandidateLoss,
      relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1
    });
  }
  return { buckets, periods };
}

// src/decision/decideComparison.ts
function decideComparison(input) {
  const { hypothesis, alpha } = input;
  const reasons = [];
  if (input.identicalLosses) {
    const verdict2 = hypothesis.rejectWhen === "below" && hypothesis.boundary < 0 ? "fail" : "pass";
    reasons.push(
      verdict2 === "pass" ? "The candidate has exactly the same loss as the baseline on every row." : "The candidate has exactly the same loss as the baseline on every row, so it cannot be better by the margin."
    );
    return { verdict: verdict2, reasons, rejected: { dieboldMariano: null, bootstrap: null } };
  }
  const rejects = (e) => {
    if (e.state === "zero-variance" || e.state === "identical") {
      const gap = e.mean - hypothesis.boundary;
      return hypothesis.rejectWhen === "above" ? gap > 0 : gap < 0;
    }
    if (e.pValue === null) return null;
    return e.pValue <= alpha;
  };
  const dm = rejects(input.dieboldMariano);
  const bs = rejects(input.bootstrap);
  const rejected = { dieboldMariano: dm, bootstrap: bs };
  const tests = [
    { e: input.dieboldMariano, r: dm },
    { e: input.bootstrap, r: bs }
  ];
  for (const { e, r } of tests) reasons.push(describeTest(e, r, alpha, hypothesis));
  const onReject = hypothesis.onReject;
  const onKeep = onReject === "fail" ? "pass" : "fail";
  let verdict;
  const considered = input.agreement === "dm" ? [dm] : input.agreement === "bootstrap" ? [bs] : [dm, bs];
  const known = considered.filter((r) => r !== null);
  if (known.length === 0) {
    verdict = "warn";
    reasons.push("No test could be computed, so there is no evidence either way.");
  } else if (input.agreement === "either") {
    verdict = known.includes(true) ? onReject : onKeep;
  } else if (known.length < considered.length) {
    verdict = known[0] ? onReject : onKeep;
    reasons.push("Only one test could be computed; the verdict rests on it alone.");
  } else if (known.every((r) => r)) {
    verdict = onReject;
  } else if (known.every((r) => !r)) {
    verdict = onKeep;
  } else {
    verdict = "warn";
    reasons.push("The two tests disagree, so the gate asks a person to look (agreement: both).");
  }
  if (input.n < input.minPoints) {
    reasons.push(
      `Too little data: ${input.n} time points, fewer than the ${input.minPoints} required for a firm verdict.`
    );
    verdict = input.shortData;
  }
  return { verdict, reasons, rejected };
}
function describeTest(e, rejected, alpha, hypothesis) {
  if (rejected === null) return `${e.label}: could not be computed (${e.state}).`;
  if (e.state === "zero-variance" || e.state === "identical") {
    return `${e.label}: the differential is constant, so its sign decides: ${rejected ? "evidence that" : "no evidence that"} ${hypothesis.alternative}.`;
  }
  const text = formatPValue(e.pValue);
  const p = text.startsWith("<") ? `p ${text}` : `p = ${text}`;
  return rejected ? `${e.label}: ${p} \u2264 \u03B1 = ${alpha}: evidence that ${hypothesis.alternative}.` : `${e.label}: ${p} > \u03B1 = ${alpha}: no evidence that ${hypothesis.alternative}.`;
}

// src/statistics/bootstrap/basicBootstrapInference.ts
function tailProbability(level) {
  return Number((1 - level).toPrecision(15));
}
function tailOrderStatistic(tail, resamples) {
  const denominator = resamples + 1;
  let k = Math.min(resamples, Math.max(0, Math.floor(tail * denominator)));
  while (k < resamples && (k + 1) / denominator <= tail) k++;
  while (k > 0 && k / denominator > tail) k--;
  return k;
}
function minimumResamples(level) {
  const alpha = tailProbability(level);
  let resamples = Math.max(1, Math.floor(2 / alpha) - 1);
  while (tailOrderStatistic(alpha / 2, resamples) < 1) resamples++;
  while (resamples > 1 && tailOrderStatistic(alpha / 2, resamples - 1) >= 1) resamples--;
  return resamples;
}
function basicBootstrapInference(reflectedSorted, margin, level) {
  const resamples = reflectedSorted.length;
  const alpha = tailProbability(level);
  const kTwo = tailOrderStatistic(alpha / 2, resamples);
  const kOne = tailOrderStatistic(alpha, resamples);
  if (kTwo < 1) {
    throw new RangeError(
      `${resamples} resamples are too few for a ${level} interval (need at least ${minimumResamples(level)})`
    );
  }
  let atOrBelow = 0;
  let atOrAbove = 0;
  for (let b = 0; b < resamples; b++) {
    const u = reflectedSorted[b];
    if (u <= margin) atOrBelow++;
    if (u >= margin) atOrAbove++;
  }
  const pValue = (1 + atOrBelow) / (resamples + 1);
  const pAbove = (1 + atOrAbove) / (resamples + 1);
  return {
    interval: {
      level,
      lower: reflectedSorted[kTwo - 1],
      upper: reflectedSorted[resamples - kTwo]
    },
    oneSidedLower: { level, alpha, lower: reflectedSorted[kOne - 1] },
    pValue,
    pValueBelow: pAbove,
    pValueTwoSided: Math.min(1, 2 * Math.min(pValue, pAbove))
  };
}

// src/intervals/intervalSet.ts
var lo = (p) => p.lower ?? Number.NEGATIVE_INFINITY;
var hi = (p) => p.upper ?? Number.POSITIVE_INFINITY;
var piece = (lower, upper) => ({
  lower: lower === Number.NEGATIVE_INFINITY ? null : lower,
  upper: upper === Number.POSITIVE_INFINITY ? null : upper
});
function normaliseSet(pieces) {
  const sorted = pieces.filter((p) => lo(p) <= hi(p)).sort((a, b) => lo(a) - lo(b));
  const out = [];
  for (const p of sorted) {
    const last = out[out.length - 1];
    if (last !== void 0 && lo(p) <= last.upper) last.upper = Math.max(last.upper, hi(p));
    else out.push({ lower: lo(p), upper: hi(p) });
  }
  return out.map((p) => piece(p.lower, p.upper));
}
function unionOfSets(a, b) {
  return normaliseSet([...a, ...b]);
}
function intersectionOfSets(a, b) {
  const out = [];
  for (const p of a) {
    for (const q of b) {
      const lower = Math.max(lo(p), lo(q));
      const upper = Math.min(hi(p), hi(q));
      if (lower <= upper) out.push(piece(lower, upper));
    }
  }
  return normaliseSet(out);
}
function hullOfSet(set) {
  const first = set[0];
  const last = set[set.length - 1];
  if (first === void 0 || last === void 0) return null;
  return { lower: first.lower, upper: last.upper };
}
function complementOfSet(set) {
  const out = [];
  let from = Number.NEGATIVE_INFINITY;
  for (const p of normaliseSet(set)) {
    if (lo(p) > from) out.push(piece(from, lo(p)));
    from = hi(p);
  }
  if (from < Number.POSITIVE_INFINITY) out.push(piece(from, Number.POSITIVE_INFINITY));
  return out;
}

// src/intervals/bootstrapMarginSet.ts
function bootstrapMarginSet(input) {
  const { meanD, meanB, deviationsD, deviationsB, tail } = input;
  const resamples = deviationsD.length;
  const k = tailOrderStatistic(tail, resamples);
  const rising = [];
  const falling = [];
  let flatBelow = 0;
  let flatAbove = 0;
  for (let b = 0; b < resamples; b++) {
    const a = meanD - deviationsD[b];
    const c = meanB - deviationsB[b];
    if (c > 0) rising.push(a / c);
    else if (c < 0) falling.push(a / c);
    else {
      if (a <= 0) flatBelow++;
      if (a >= 0) flatAbove++;
    }
  }
  const up = Float64Array.from(rising).sort();
  const down = Float64Array.from(falling).sort();
  const accepted = (r) => {
    const upAtOrBelow = countAtOrBelow(up, r);
    const upAtOrAbove = up.length - countBelow(up, r);
    const downAtOrBelow = countAtOrBelow(down, r);
    const downAtOrAbove = down.length - countBelow(down, r);
    const nonPositive = flatBelow + upAtOrBelow + downAtOrAbove;
    const nonNegative = flatAbove + upAtOrAbove + downAtOrBelow;
    return nonPositive >= k && nonNegative >= k;
  };
  if (up.length === 0 && down.length === 0) {
    return accepted(0) ? [{ lower: null, upper: null }] : [];
  }
  const points = Float64Array.from([...up, ...down]).sort();
  const unique = [];
  for (const p of points) if (unique[unique.length - 1] !== p) unique.push(p);
  const pieces = [];
  let open;
  const close = (upper) => {
    if (open !== void 0) pieces.push({ lower: open, upper });
    open = void 0;
  };
  const m = unique.length;
  if (accepted(unique[0] - 1 - Math.abs(unique[0]))) open = null;
  for (let i = 0; i < m; i++) {
    const p = unique[i];
    if (accepted(p)) {
      if (open === void 0) open = p;
    } else {
      close(p);
    }
    const next = unique[i + 1];
    const between = next === void 0 ? p + 1 + Math.abs(p) : p + (next - p) / 2;
    if (accepted(between)) {
      if (open === void 0) open = p;
    } else {
      close(p);
    }
  }
  close(null);
  return normaliseSet(pieces);
}
function countAtOrBelow(sorted, r) {
  let lo2 = 0;
  let hi2 = sorted.length;
  while (lo2 < hi2) {
    const mid = lo2 + hi2 >>> 1;
    if (sorted[mid] <= r) lo2 = mid + 1;
    else hi2 = mid;
  }
  return lo2;
}
function countBelow(sorted, r) {
  let lo2 = 0;
  let hi2 = sorted.length;
  while (lo2 < hi2) {
    const mid = lo2 + hi2 >>> 1;
    if (sorted[mid] < r) lo2 = mid + 1;
    else hi2 = mid;
  }
  return lo2;
}

// src/statistics/distributions.ts
var import_stats_base_dists_normal_cdf = __toESM(require_lib57(), 1);
var import_stats_base_dists_normal_quantile = __toESM(require_lib62(), 1);
var import_stats_base_dists_t_cdf = __toESM(require_lib129(), 1);
var import_stats_base_dists_t_quantile = __toESM(require_lib139(), 1);
function standardNormalUpperTail(x) {
  return (0, import_stats_base_dists_normal_cdf.default)(-x, 0, 1);
}
function standardNormalTwoSided(x) {
  return Math.min(1, 2 * (0, import_stats_base_dists_normal_cdf.default)(-Math.abs(x), 0, 1));
}
function standardNormalQuantile(p) {
  return (0, import_stats_base_dists_normal_quantile.default)(p, 0, 1);
}
function studentTUpperTail(x, degreesOfFreedom) {
  return (0, import_stats_base_dists_t_cdf.default)(-x, degreesOfFreedom);
}
function studentTTwoSided(x, degreesOfFreedom) {
  return Math.min(1, 2 * (0, import_stats_base_dists_t_cdf.default)(-Math.abs(x), degreesOfFreedom));
}
function studentTQuantile(p, degreesOfFreedom) {
  return (0, import_stats_base_dists_t_quantile.default)(p, degreesOfFreedom);
}

// src/statistics/ewcLongRunVariance.ts
function ewcDegreesOfFreedom(n) {
  return Math.max(2, Math.round(0.4 * n ** (2 / 3)));
}
function ewcLongRunVariance(x, degreesOfFreedom = ewcDegreesOfFreedom(x.length)) {
  const n = x.length;
  const nu = degreesOfFreedom;
  if (!Number.isInteger(nu) || nu < 1 || nu > n - 1) {
    throw new RangeError(
      `ewcLongRunVariance: \u03BD must be an integer in 1..${n - 1} for n = ${n}, got ${nu}`
    );
  }
  const centre = mean(x);
  const u = new Float64Array(n);
  for (let t = 0; t < n; t++) u[t] = x[t] - centre;
  const cosTable = new Float64Array(n + 1);
  for (let r = 0; r <= n; r++) cosTable[r] = Math.cos(Math.PI * r / (2 * n));
  const period = 4 * n;
  const half = 2 * n;
  let sumOfSquares = 0;
  for (let j = 1; j <= nu; j++) {
    const step = 2 * j % period;
    let k = j % period;
    let lambda = 0;
    for (let t = 0; t < n; t++) {
      const r = k > half ? period - k : k;
      const c = r > n ? -cosTable[half - r] : cosTable[r];
      lambda += c * u[t];
      k += step;
      if (k >= period) k -= period;
    }
    lambda *= Math.sqrt(2 / n);
    sumOfSquares += lambda * lambda;
  }
  return { value: sumOfSquares / nu, degreesOfFreedom: nu };
}

// src/statistics/harveyLeybourneNewbold.ts
function harveyLeybourneNewboldFactor(n, horizon) {
  if (!(horizon < n)) return null;
  return Math.sqrt((n - horizon) * (n - horizon + 1)) / n;
}
function harveyLeybourneNewbold(statistic, n, horizon) {
  const factor = harveyLeybourneNewboldFactor(n, horizon);
  if (factor === null) return null;
  const corrected = statistic * factor;
  const degreesOfFreedom = n - 1;
  return {
    statistic: corrected,
    pValue: studentTUpperTail(corrected, degreesOfFreedom),
    pValueTwoSided: studentTTwoSided(corrected, degreesOfFreedom),
    degreesOfFreedom
  };
}

// src/statistics/varianceTolerance.ts
function isEffectivelyNonPositive(longRunVariance, gamma0, n) {
  return !(longRunVariance > n * Number.EPSILON * gamma0);
}

// src/statistics/uniformLongRunVariance.ts
function uniformWeightSum(x, lag) {
  const gamma = autocovariances(x, lag);
  let sum = gamma[0];
  for (let k = 1; k <= lag; k++) sum += 2 * gamma[k];
  return sum;
}
function uniformLongRunVariance(x, lag) {
  const uniformValue = uniformWeightSum(x, lag);
  const gamma0 = autocovariances(x, 0)[0];
  if (!isEffectivelyNonPositive(uniformValue, gamma0, x.length)) {
    return { value: uniformValue, estimator: "uniform", lag, uniformValue, note: null };
  }
  const value = bartlettLongRunVariance(x, lag);
  return {
    value,
    estimator: "bartlett",
    lag,
    uniformValue,
    note: `The uniform-weight long-run variance at lag ${lag} is not positive (${uniformValue.toPrecision(6)}), so the Bartlett (Newey\u2013West) weights were used instead, with the same lag ${lag}.`
  };
}

// src/intervals/fiellerSet.ts
function fiellerSet(input) {
  const { meanD, meanB, varDD, varDB, varBB, critical } = input;
  const c2 = critical * critical;
  const a = meanB * meanB - c2 * varBB;
  const b = meanD * meanB - c2 * varDB;
  const e = meanD * meanD - c2 * varDD;
  const discriminant = b * b - a * e;
  if (a === 0) {
    if (b > 0) return [{ lower: e / (2 * b), upper: null }];
    if (b < 0) return [{ lower: null, upper: e / (2 * b) }];
    return e <= 0 ? [{ lower: null, upper: null }] : [];
  }
  if (discriminant < 0) return a > 0 ? [] : [{ lower: null, upper: null }];
  const root = Math.sqrt(discriminant);
  const q = b + (b >= 0 ? root : -root);
  const r1 = q / a;
  const r2 = q === 0 ? 0 : e / q;
  const small = Math.min(r1, r2);
  const large = Math.max(r1, r2);
  if (a > 0) return [{ lower: small, upper: large }];
  return normaliseSet([
    { lower: null, upper: small },
    { lower: large, upper: null }
  ]);
}

// src/intervals/longRunCovariance.ts
function longRunCovariance(d, b, sum, variance) {
  const dd = variance(d);
  const bb = variance(b);
  const ss = variance(sum);
  return { dd, bb, db: (ss - dd - bb) / 2 };
}

// src/intervals/dieboldMarianoMarginSet.ts
function dieboldMarianoMarginSet(input) {
  const { candidate, baseline, horizon, tail } = input;
  const n = baseline.length;
  if (n < 3) return null;
  const d = new Float64Array(n);
  for (let t = 0; t < n; t++) d[t] = candidate[t] - baseline[t];
  let estimator = input.estimator;
  let critical;
  const meanD = mean(d);
  const meanB = mean(baseline);
  const fieller = (v) => fiellerSet({ meanD, meanB, varDD: v.dd / n, varDB: v.db / n, varBB: v.bb / n, critical });
  let covariance;
  let set;
  if (estimator === "ewc" || estimator === "ewc-ar1") {
    const nu = input.degreesOfFreedom;
    if (nu === null) return null;
    covariance = longRunCovariance(d, baseline, candidate, (x) => ewcLongRunVariance(x, nu).value);
    critical = studentTQuantile(1 - tail, nu);
    if (!finite(covariance)) return null;
    set = fieller(covariance);
  } else {
    const lag = selectLag(d, input.lag, horizon).lag;
    const factor = harveyLeybourneNewboldFactor(n, horizon);
    critical = factor === null ? standardNormalQuantile(1 - tail) : studentTQuantile(1 - tail, n - 1) / factor;
    const bartlett = longRunCovariance(
      d,
      baseline,
      candidate,
      (x) => bartlettLongRunVariance(x, lag)
    );
    if (!finite(bartlett)) return null;
    covariance = bartlett;
    set = fieller(bartlett);
    if (estimator === "uniform") {
      const uniform = longRunCovariance(d, baseline, candidate, (x) => uniformWeightSum(x, lag));
      if (!finite(uniform)) return null;
      const positive = complementOfSet(
        fiellerSet({
          meanD: 0,
          meanB: 0,
          varDD: -uniform.dd,
          varDB: -uniform.db,
          varBB: -uniform.bb,
          critical: 1
        })
      );
      if (positive.length === 0) estimator = "bartlett";
      else {
        covariance = uniform;
        set = unionOfSets(
          intersectionOfSets(fieller(uniform), positive),
          intersectionOfSets(set, complementOfSet(positive))
        );
      }
    }
  }
  return { set, estimator, critical, covariance };
}
function finite(v) {
  return Number.isFinite(v.dd) && Number.isFinite(v.db) && Number.isFinite(v.bb);
}

// src/intervals/relativeChange.ts
function relativeChange(input) {
  const { series, settings } = input;
  const n = series.baseline.length;
  if (n === 0) return null;
  const meanB = mean(series.baseline);
  if (!(meanB > 0)) return null;
  const estimate = mean(series.candidate) / meanB - 1;
  const level = settings.confidence;
  const tail = tailProbability(level) / 2;
  let dm = null;
  if (input.dieboldMariano.state === "ok") {
    const found = dieboldMarianoMarginSet({
      candidate: series.candidate,
      baseline: series.baseline,
      estimator: settings.variance,
      lag: settings.lag,
      degreesOfFreedom: input.dieboldMariano.degreesOfFreedom,
      horizon: series.maxHorizon,
      tail
    });
    if (found !== null) dm = { set: found.set, method: `Fieller (${found.estimator})` };
  }
  let bs = null;
  const deviations = input.bootstrap.resampledDeviations;
  if (input.bootstrap.state === "ok" && deviations !== null) {
    const deviationsD = new Float64Array(deviations.candidate.length);
    for (let b = 0; b < deviationsD.length; b++) {
      deviationsD[b] = deviations.candidate[b] - deviations.baseline[b];
    }
    const d = new Float64Array(n);
    for (let t = 0; t < n; t++) d[t] = series.candidate[t] - series.baseline[t];
    bs = {
      set: bootstrapMarginSet({
        meanD: mean(d),
        meanB,
        deviationsD,
        deviationsB: deviations.baseline,
        tail
      }),
      method: "inverted bootstrap"
    };
  }
  const chosen = combine(input.agreement, dm, bs);
  if (chosen === null) return null;
  const hull = hullOfSet(chosen.set);
  return {
    estimate,
    level,
    lower: hull?.lower ?? null,
    upper: hull?.upper ?? null,
    method: chosen.method,
    ...chosen.set.length === 1 ? {} : { pieces: chosen.set }
  };
}
function combine(agreement, dm, bs) {
  if (agreement === "dm") return dm;
  if (agreement === "bootstrap") return bs;
  if (dm === null || bs === null) return dm ?? bs;
  return agreement === "both" ? { set: unionOfSets(dm.set, bs.set), method: `${dm.method} \u222A ${bs.method}` } : { set: intersectionOfSets(dm.set, bs.set), method: `${dm.method} \u2229 ${bs.method}` };
}

// node_modules/pure-rand/lib/esm/generator/xoroshiro128plus.js
var jumps = [
  3639956645,
  3750757012,
  1261568508,
  386426335
];
var XoroShiro128Plus = class XoroShiro128Plus2 {
  constructor(s01, s00, s11, s10) {
    this.s01 = s01;
    this.s00 = s00;
    this.s11 = s11;
    this.s10 = s10;
  }
  clone() {
    return new XoroShiro128Plus2(this.s01, this.s00, this.s11, this.s10);
  }
  next() {
    const out = this.s00 + this.s10 | 0;
    const a0 = this.s10 ^ this.s00;
    const a1 = this.s11 ^ this.s01;
    const s00 = this.s00;
    const s01 = this.s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return out;
  }
  jump() {
    let ns01 = 0;
    let ns00 = 0;
    let ns11 = 0;
    let ns10 = 0;
    let s01 = this.s01;
    let s00 = this.s00;
    let s11 = this.s11;
    let s10 = this.s10;
    for (let i = 0; i !== 4; ++i) {
      const ji = jumps[i];
      for (let mask = 1; mask; mask <<= 1) {
        if (ji & mask) {
          ns01 ^= s01;
          ns00 ^= s00;
          ns11 ^= s11;
          ns10 ^= s10;
        }
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const s00_ = s00;
        const s01_ = s01;
        s00 = s00_ << 24 ^ s01_ >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01_ << 24 ^ s00_ >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
    }
    this.s01 = ns01;
    this.s00 = ns00;
    this.s11 = ns11;
    this.s10 = ns10;
  }
  getState() {
    return [
      this.s01,
      this.s00,
      this.s11,
      this.s10
    ];
  }
};
function xoroshiro128plusFromState(state) {
  if (!(state.length === 4)) throw new Error("The state must have been produced by a xoroshiro128plus RandomGenerator");
  return new XoroShiro128Plus(state[0], state[1], state[2], state[3]);
}

// src/random/splitMix64.ts
var MASK_64 = (1n << 64n) - 1n;
var GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;
function splitMix64Words(seed, count) {
  let state = BigInt(seed) & MASK_64;
  const words = [];
  for (let i = 0; i < count; i++) {
    state = state + GOLDEN_GAMMA & MASK_64;
    let z = state;
    z = (z ^ z >> 30n) * 0xbf58476d1ce4e5b9n & MASK_64;
    z = (z ^ z >> 27n) * 0x94d049bb133111ebn & MASK_64;
    z = z ^ z >> 31n;
    words.push(Number(BigInt.asIntN(32, z >> 32n)), Number(BigInt.asIntN(32, z)));
  }
  return words;
}

// src/random/randomSource.ts
var TWO_POW_26 = 67108864;
var TWO_POW_MINUS_53 = 1 / 9007199254740992;
function randomStreams(factory, seed, first) {
  if (factory.sequence !== void 0) return factory.sequence(seed, first);
  let stream = first;
  return { next: () => factory(seed, stream++) };
}
function createRandomSource(seed, stream = 0) {
  return createRandomStreams(seed, stream).next();
}
createRandomSource.sequence = createRandomStreams;
function createRandomStreams(seed, first = 0) {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 \u2212 1, got ${seed}`);
  }
  if (!Number.isSafeInteger(first) || first < 0) {
    throw new RangeError(`stream must be a non-negative integer, got ${first}`);
  }
  const [s0High, s0Low, s1High, s1Low] = splitMix64Words(seed, 2);
  const cursor = xoroshiro128plusFromState([s0High, s0Low, s1High, s1Low]);
  for (let k = 0; k < first; k++) cursor.jump();
  let started = false;
  return {
    next: () => {
      if (started) cursor.jump();
      started = true;
      return sourceOf(cursor.clone());
    }
  };
}
var TWO_POW_32 = 4294967296;
var Xoroshiro128PlusSource = class {
  s01;
  s00;
  s11;
  s10;
  pending = 0;
  hasPending = false;
  constructor(state) {
    this.s01 = state[0] | 0;
    this.s00 = state[1] | 0;
    this.s11 = state[2] | 0;
    this.s10 = state[3] | 0;
  }
  nextUint32() {
    if (this.hasPending) {
      this.hasPending = false;
      return this.pending >>> 0;
    }
    const s00 = this.s00;
    const s01 = this.s01;
    const s10 = this.s10;
    const s11 = this.s11;
    const low = (s00 >>> 0) + (s10 >>> 0);
    const carry = low >= TWO_POW_32 ? 1 : 0;
    this.pending = low | 0;
    this.hasPending = true;
    const high = s01 + s11 + carry >>> 0;
    const a0 = s10 ^ s00;
    const a1 = s11 ^ s01;
    this.s00 = s00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
    this.s01 = s01 << 24 ^ s00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
    this.s10 = a1 << 5 ^ a0 >>> 27;
    this.s11 = a0 << 5 ^ a1 >>> 27;
    return high;
  }
  nextDouble() {
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
  }
};
function sourceOf(generator) {
  return new Xoroshiro128PlusSource(generator.getState());
}

// src/statistics/bootstrap/flatTopWindow.ts
function flatTop(s) {
  const a = Math.abs(s);
  if (a <= 0.5) return 1;
  if (a <= 1) return 2 * (1 - a);
  return 0;
}

// src/statistics/bootstrap/automaticBlockLength.ts
function automaticBlockLength(d) {
  const n = d.length;
  const notes = [];
  const runLength = Math.max(5, Math.ceil(Math.log10(Math.max(n, 1))));
  const maxLag = Math.ceil(Math.sqrt(n)) + runLength;
  const maxBlockLength = Math.max(1, Math.ceil(Math.min(3 * Math.sqrt(n), n / 3)));
  const criticalValue = n > 0 ? 2 * Math.sqrt(Math.log10(n) / n) : Number.NaN;
  const base = { n, runLength, maxLag, maxBlockLength, criticalValue };
  if (n < 2) {
    notes.push(`series has ${n} observation(s); block length 1`);
    return degenerate(base, 1, notes);
  }
  const lags = Math.min(maxLag, n - 1);
  const gamma = autocovariances(d, lags);
  const variance = gamma[0];
  if (!(variance > 0)) {
    notes.push("constant series: no dependence to preserve; block length 1");
    return degenerate(base, 1, notes);
  }
  let firstSmallLag = null;
  let run = 0;
  for (let k = 1; k <= lags; k++) {
    if (Math.abs(gamma[k] / variance) < criticalValue) {
      run++;
      if (run === runLength) {
        firstSmallLag = k - runLength + 1;
        break;
      }
    } else {
      run = 0;
    }
  }
  const runFound = firstSmallLag !== null;
  if (!runFound) notes.push(`no run of ${runLength} small autocorrelations up to lag ${lags}`);
  const bandwidth = Math.min(firstSmallLag === null ? maxLag : 2 * firstSmallLag, maxLag, n - 1);
  let gHat = 0;
  let spectralSum = gamma[0];
  for (let k = 1; k <= bandwidth; k++) {
    const weight = flatTop(k / bandwidth);
    if (weight === 0) continue;
    gHat += 2 * weight * k * gamma[k];
    spectralSum += 2 * weight * gamma[k];
  }
  const dValue = 2 * spectralSum * spectralSum;
  let unclamped = null;
  let blockLength;
  if (dValue > 0) {
    unclamped = Math.cbrt(2 * gHat * gHat / dValue) * Math.cbrt(n);
    blockLength = Math.min(Math.max(unclamped, 1), maxBlockLength);
    if (unclamped < 1) notes.push(`estimate ${unclamped} raised to 1`);
    if (unclamped > maxBlockLength) notes.push(`estimate ${unclamped} capped at ${maxBlockLength}`);
  } else {
    blockLength = gHat === 0 ? 1 : maxBlockLength;
    notes.push(`spectral estimate at zero is 0; block length ${blockLength}`);
  }
  return {
    ...base,
    runFound,
    firstSmallLag,
    bandwidth,
    gHat,
    spectralSum,
    d: dValue,
    unclamped,
    blockLength,
    notes
  };
}
function degenerate(base, blockLength, notes) {
  return {
    ...base,
    runFound: false,
    firstSmallLag: null,
    bandwidth: 0,
    gHat: 0,
    spectralSum: 0,
    d: 0,
    unclamped: null,
    blockLength,
    notes
  };
}

// src/statistics/bootstrap/centring.ts
function meanOf(d) {
  let sum = 0;
  for (let t = 0; t < d.length; t++) sum += d[t];
  return sum / d.length;
}

// src/random/aliasTable.ts
function buildAliasTable(probabilities) {
  const size = probabilities.length;
  let sum = 0;
  for (let i = 0; i < size; i++) sum += probabilities[i];
  const scaled = new Float64Array(size);
  for (let i = 0; i < size; i++) scaled[i] = probabilities[i] * size / sum;
  const threshold = new Float64Array(size);
  const alias = new Int32Array(size);
  const small = [];
  const large = [];
  for (let i = size - 1; i >= 0; i--) (scaled[i] < 1 ? small : large).push(i);
  while (small.length > 0 && large.length > 0) {
    const less = small.pop();
    const more = large.pop();
    threshold[less] = scaled[less];
    alias[less] = more;
    scaled[more] = scaled[more] + scaled[less] - 1;
    (scaled[more] < 1 ? small : large).push(more);
  }
  for (const i of large) {
    threshold[i] = 1;
    alias[i] = i;
  }
  for (const i of small) {
    threshold[i] = 1;
    alias[i] = i;
  }
  return { threshold, alias };
}

// src/random/geometricSampler.ts
var MAX_COLUMNS_LOG2 = 12;
var OVERFLOW_PROBABILITY = 1 / 1024;
function createGeometricSampler(mean2) {
  if (!(Number.isFinite(mean2) && mean2 >= 1)) {
    throw new RangeError(`the mean of a geometric length must be a finite number \u2265 1, got ${mean2}`);
  }
  if (mean2 === 1) {
    const table = { threshold: Float64Array.of(1, 0), alias: Int32Array.of(0, 0) };
    return { mean: mean2, truncation: 1, table, inline: null, sample: () => 1 };
  }
  const p = 1 / mean2;
  const q = 1 - p;
  let bits = 1;
  while (bits < MAX_COLUMNS_LOG2 && q ** (2 ** bits - 1) > OVERFLOW_PROBABILITY) bits++;
  const columns = 2 ** bits;
  const truncation = columns - 1;
  const probabilities = new Float64Array(columns);
  for (let k = 1; k <= truncation; k++) probabilities[k - 1] = p * q ** (k - 1);
  probabilities[truncation] = q ** truncation;
  const { threshold, alias } = buildAliasTable(probabilities);
  const shift = 32 - bits;
  const coinMask = 2 ** shift - 1;
  const coinScale = 2 ** shift;
  const edge = new Float64Array(columns);
  const edgeFraction = new Float64Array(columns);
  for (let i = 0; i < columns; i++) {
    const scaled = threshold[i] * coinScale;
    edge[i] = Math.floor(scaled);
    edgeFraction[i] = scaled - edge[i];
  }
  const overflow = truncation;
  return {
    mean: mean2,
    truncation,
    table: { threshold, alias },
    inline: { shift, coinMask, edge, edgeFraction, alias, truncation },
    sample(random, cap) {
      let total = 0;
      for (; ; ) {
        const x = random.nextUint32();
        const column = x >>> shift;
        const coin = x & coinMask;
        const cut = edge[column];
        const keep = coin !== cut ? coin < cut : random.nextDouble() < edgeFraction[column];
        const outcome = keep ? column : alias[column];
        if (outcome !== overflow) {
          total += outcome + 1;
          return Math.min(total, cap);
        }
        total += truncation;
        if (total >= cap) return cap;
      }
    }
  };
}

// src/statistics/bootstrap/centredPrefixSums.ts
function centredPrefixSums(d, mean2) {
  const n = d.length;
  const prefix = new Float64Array(2 * n + 1);
  let running = 0;
  for (let i = 0; i < 2 * n; i++) {
    running += d[i < n ? i : i - n] - mean2;
    prefix[i + 1] = running;
  }
  return prefix;
}

// src/statistics/bootstrap/resampleMeanDeviation.ts
function resampleMeanDeviation(prefix, n, blocks) {
  const { starts, lengths, count } = blocks;
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const s = starts[i];
    sum += prefix[s + lengths[i]] - prefix[s];
  }
  return sum / n;
}

// src/statistics/bootstrap/sampleStandardDeviation.ts
function sampleStandardDeviation(values) {
  const m = values.length;
  if (m < 2) return 0;
  let sum = 0;
  for (let i = 0; i < m; i++) sum += values[i];
  const centre = sum / m;
  let squares = 0;
  for (let i = 0; i < m; i++) squares += (values[i] - centre) ** 2;
  return Math.sqrt(squares / (m - 1));
}

// src/random/uniformIndex.ts
var TWO_POW_322 = 4294967296;
var LEMIRE_LIMIT = 2097152;
function uniformIndex(random, n) {
  if (n <= 1) return 0;
  if (n <= LEMIRE_LIMIT) {
    let m = random.nextUint32() * n;
    let high = Math.floor(m / TWO_POW_322);
    let low = m - high * TWO_POW_322;
    if (low < n) {
      const threshold = TWO_POW_322 % n;
      while (low < threshold) {
        m = random.nextUint32() * n;
        high = Math.floor(m / TWO_POW_322);
        low = m - high * TWO_POW_322;
      }
    }
    return high;
  }
  const shift = Math.clz32(n - 1);
  for (; ; ) {
    const candidate = shift === 0 ? random.nextUint32() : random.nextUint32() >>> shift;
    if (candidate < n) return candidate;
  }
}

// src/statistics/bootstrap/stationaryBlocks.ts
function allocateStationaryBlocks(n) {
  return { starts: new Int32Array(n), lengths: new Int32Array(n), count: 0 };
}
function drawStationaryBlocks(n, sampler, random, into = allocateStationaryBlocks(n)) {
  const { starts, lengths } = into;
  let filled = 0;
  let count = 0;
  while (filled < n) {
    starts[count] = uniformIndex(random, n);
    const length = sampler.sample(random, n - filled);
    lengths[count] = length;
    filled += length;
    count++;
  }
  into.count = count;
  return into;
}

// src/statistics/bootstrap/resampleDeviationsInline.ts
var TWO_POW_323 = 4294967296;
var TWO_POW_MINUS_32 = 1 / TWO_POW_323;
var LEMIRE_LIMIT2 = 2097152;
function resampleDeviationsInline(prefix, n, sampler, source, count) {
  if (sampler.inline === null) return unitBlocks(prefix, n, source, count);
  return geometricBlocks(prefix, n, sampler, source, count);
}
function unitBlocks(prefix, n, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const lemire = n <= LEMIRE_LIMIT2;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const step = new Float64Array(n);
  for (let s = 0; s < n; s++) step[s] = prefix[s + 1] - prefix[s];
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let sum = 0;
    while (filled < n) {
      if (lemire && !has) {
        const stop = n - 1;
        let rejected = false;
        while (filled < stop) {
          const lo2 = (s00 >>> 0) + (s10 >>> 0);
          const c = lo2 >= P32 ? 1 : 0;
          const low = lo2 | 0;
          const high = s01 + s11 + c >>> 0;
          const a0 = s10 ^ s00;
          const a1 = s11 ^ s01;
          const t00 = s00;
          s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
          s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
          s10 = a1 << 5 ^ a0 >>> 27;
          s11 = a0 << 5 ^ a1 >>> 27;
          const m1 = high * n;
          const first = Math.floor(m1 * INV32);
          if (m1 - first * P32 < threshold) {
            pend = low;
            has = true;
            rejected = true;
            break;
          }
          sum += step[first];
          filled++;
          const m2 = (low >>> 0) * n;
          const second = Math.floor(m2 * INV32);
          if (m2 - second * P32 < threshold) {
            rejected = true;
            break;
          }
          sum += step[second];
          filled++;
        }
        if (rejected) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          sum += step[rejectedStart(source, n, threshold)];
          filled++;
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
          continue;
        }
        if (filled >= n) break;
      }
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      sum += step[start];
      filled++;
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function geometricBlocks(prefix, n, sampler, source, count) {
  const P32 = 4294967296;
  const INV32 = 1 / 4294967296;
  const out = new Float64Array(count);
  const inline = sampler.inline;
  const lemire = n <= LEMIRE_LIMIT2;
  const threshold = P32 % n;
  const maskShift = Math.clz32(n - 1);
  let s00 = source.s00;
  let s01 = source.s01;
  let s10 = source.s10;
  let s11 = source.s11;
  let pend = source.pending;
  let has = source.hasPending;
  const { shift, coinMask, edge, alias, truncation } = inline;
  const starts = new Int32Array(n);
  const lengths = new Int32Array(n);
  for (let r = 0; r < count; r++) {
    let filled = 0;
    let blocks = 0;
    while (filled < n) {
      let x;
      if (has) {
        x = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        x = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      let start;
      if (lemire) {
        const m = x * n;
        start = Math.floor(m * INV32);
        if (m - start * P32 < threshold) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = rejectedStart(source, n, threshold);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      } else {
        start = maskShift === 0 ? x : x >>> maskShift;
        if (start >= n) {
          source.s00 = s00;
          source.s01 = s01;
          source.s10 = s10;
          source.s11 = s11;
          source.pending = pend;
          source.hasPending = has;
          start = bitmaskStart(source, n, maskShift);
          s00 = source.s00;
          s01 = source.s01;
          s10 = source.s10;
          s11 = source.s11;
          pend = source.pending;
          has = source.hasPending;
        }
      }
      let y;
      if (has) {
        y = pend >>> 0;
        has = false;
      } else {
        const lo2 = (s00 >>> 0) + (s10 >>> 0);
        const c = lo2 >= P32 ? 1 : 0;
        pend = lo2 | 0;
        has = true;
        y = s01 + s11 + c >>> 0;
        const a0 = s10 ^ s00;
        const a1 = s11 ^ s01;
        const t00 = s00;
        s00 = t00 << 24 ^ s01 >>> 8 ^ a0 ^ a0 << 16;
        s01 = s01 << 24 ^ t00 >>> 8 ^ a1 ^ (a1 << 16 | a0 >>> 16);
        s10 = a1 << 5 ^ a0 >>> 27;
        s11 = a0 << 5 ^ a1 >>> 27;
      }
      const column = y >>> shift;
      const coin = y & coinMask;
      const cut = edge[column];
      let length;
      if (coin !== cut) {
        const outcome = coin < cut ? column : alias[column];
        length = outcome !== truncation ? outcome + 1 : -1;
      } else {
        length = -1;
      }
      const left = n - filled;
      if (length < 0) {
        source.s00 = s00;
        source.s01 = s01;
        source.s10 = s10;
        source.s11 = s11;
        source.pending = pend;
        source.hasPending = has;
        length = finishLength(source, sampler, column, coin, cut, left);
        s00 = source.s00;
        s01 = source.s01;
        s10 = source.s10;
        s11 = source.s11;
        pend = source.pending;
        has = source.hasPending;
      } else if (length > left) {
        length = left;
      }
      starts[blocks] = start;
      lengths[blocks] = length;
      blocks++;
      filled += length;
    }
    let sum = 0;
    for (let i = 0; i < blocks; i++) {
      const s = starts[i];
      sum += prefix[s + lengths[i]] - prefix[s];
    }
    out[r] = sum / n;
  }
  source.s00 = s00;
  source.s01 = s01;
  source.s10 = s10;
  source.s11 = s11;
  source.pending = pend;
  source.hasPending = has;
  return out;
}
function rejectedStart(source, n, threshold) {
  for (; ; ) {
    const m = source.nextUint32() * n;
    const high = Math.floor(m * TWO_POW_MINUS_32);
    if (m - high * TWO_POW_323 >= threshold) return high;
  }
}
function bitmaskStart(source, n, maskShift) {
  for (; ; ) {
    const x = source.nextUint32();
    const candidate = maskShift === 0 ? x : x >>> maskShift;
    if (candidate < n) return candidate;
  }
}
function finishLength(source, sampler, column, coin, cut, cap) {
  const { edgeFraction, alias, truncation } = sampler.inline;
  const keep = coin !== cut ? coin < cut : source.nextDouble() < edgeFraction[column];
  const outcome = keep ? column : alias[column];
  if (outcome !== truncation) return Math.min(outcome + 1, cap);
  if (truncation >= cap) return cap;
  return truncation + sampler.sample(source, cap - truncation);
}

// src/statistics/bootstrap/resampleJob.ts
var RESAMPLES_PER_STREAM = 256;
function streamCount(resamples) {
  return Math.ceil(resamples / RESAMPLES_PER_STREAM);
}
function streamShare(resamples, stream) {
  const first = stream * RESAMPLES_PER_STREAM;
  return { first, count: Math.max(0, Math.min(RESAMPLES_PER_STREAM, resamples - first)) };
}
function runResampleJob(job, random = createRandomSource) {
  const out = new Float64Array(job.resamples);
  const sampler = createGeometricSampler(job.expectedBlockLength);
  const streams = randomStreams(random, job.seed, 0);
  const total = streamCount(job.resamples);
  for (let stream = 0; stream < total; stream++) {
    const { first, count } = streamShare(job.resamples, stream);
    out.set(resampleDeviationsOfStream(job.prefix, job.n, sampler, streams.next(), count), first);
  }
  return out;
}
function resampleDeviationsOfStream(prefix, n, sampler, random, count) {
  if (random instanceof Xoroshiro128PlusSource && n >= 2) {
    return resampleDeviationsInline(prefix, n, sampler, random, count);
  }
  return resampleDeviationsGeneric(prefix, n, sampler, random, count);
}
function resampleDeviationsGeneric(prefix, n, sampler, random, count) {
  const out = new Float64Array(count);
  const blocks = allocateStationaryBlocks(n);
  for (let b = 0; b < count; b++) {
    drawStationaryBlocks(n, sampler, random, blocks);
    out[b] = resampleMeanDeviation(prefix, n, blocks);
  }
  return out;
}

// src/statistics/bootstrap/stationaryBootstrap.ts
var MINIMUM_BOOTSTRAP_LENGTH = 2;
function stationaryBootstrap(d, options, random = createRandomSource, runner = runResampleJob) {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = d.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(d[t])) {
      throw new RangeError(`loss differential at position ${t} is not a finite number: ${d[t]}`);
    }
  }
  const base = { resamples, seed, expectedBlockLength };
  const notes = [];
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    notes.push(
      `series has ${n} observation(s); the bootstrap needs at least ${MINIMUM_BOOTSTRAP_LENGTH}`
    );
    return {
      state: "too-short",
      ...base,
      mean: n === 1 ? d[0] : null,
      standardError: null,
      interval: null,
      oneSidedLower: null,
      pValue: null,
      pValueBelow: null,
      pValueTwoSided: null,
      notes
    };
  }
  const constant = d.every((x) => x === d[0]);
  const identical = constant && d[0] === 0;
  const mean2 = constant ? d[0] : meanOf(d);
  let deviations;
  if (identical) {
    notes.push("every loss differential is 0 (identical forecasts); no resampling needed");
    deviations = new Float64Array(resamples);
  } else {
    if (constant) notes.push("the loss differential is constant: every resample mean equals it");
    if (expectedBlockLength > n) {
      notes.push(`expected block length ${expectedBlockLength} exceeds the series length ${n}`);
    }
    deviations = stationaryResampleDeviations(
      d,
      mean2,
      expectedBlockLength,
      resamples,
      seed,
      random,
      runner
    );
  }
  const standardError = sampleStandardDeviation(deviations);
  const reflected = new Float64Array(resamples);
  for (let b = 0; b < resamples; b++) reflected[b] = mean2 - deviations[b];
  reflected.sort();
  const inference = basicBootstrapInference(reflected, margin, confidence);
  return {
    state: identical ? "identical" : "ok",
    ...base,
    mean: mean2,
    standardError,
    interval: { ...inference.interval, method: "basic" },
    oneSidedLower: { ...inference.oneSidedLower, method: "basic" },
    pValue: inference.pValue,
    pValueBelow: inference.pValueBelow,
    pValueTwoSided: inference.pValueTwoSided,
    notes
  };
}
function stationaryResampleDeviations(d, mean2, expectedBlockLength, resamples, seed, random = createRandomSource, runner = runResampleJob) {
  const prefix = centredPrefixSums(d, mean2);
  return runner({ prefix, n: d.length, expectedBlockLength, resamples, seed }, random);
}
function validateStationaryBootstrapOptions(options) {
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`confidence must lie strictly between 0 and 1, got ${confidence}`);
  }
  const fewest = minimumResamples(confidence);
  if (!Number.isSafeInteger(resamples) || resamples < fewest) {
    throw new RangeError(
      `resamples must be an integer of at least ${fewest} for a ${confidence} interval, got ${resamples}`
    );
  }
  if (!(Number.isFinite(expectedBlockLength) && expectedBlockLength >= 1)) {
    throw new RangeError(
      `expected block length must be a finite number \u2265 1, got ${expectedBlockLength}`
    );
  }
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be an integer between 0 and 2^53 \u2212 1, got ${seed}`);
  }
  if (!Number.isFinite(margin)) throw new RangeError(`margin must be finite, got ${margin}`);
}

// src/statistics/bootstrap/relativeDifferenceBootstrap.ts
function relativeDifferenceBootstrap(candidateLoss, baselineLoss, options, random = createRandomSource) {
  validateStationaryBootstrapOptions(options);
  const { resamples, expectedBlockLength, seed, confidence, margin } = options;
  const n = candidateLoss.length;
  if (baselineLoss.length !== n) {
    throw new RangeError(`loss series differ in length: ${n} vs ${baselineLoss.length}`);
  }
  for (let t = 0; t < n; t++) {
    if (!(Number.isFinite(candidateLoss[t]) && Number.isFinite(baselineLoss[t]))) {
      throw new RangeError(`loss at position ${t} is not a finite number`);
    }
  }
  const empty = {
    resamples,
    seed,
    expectedBlockLength,
    standardError: null,
    interval: null,
    oneSidedLower: null,
    pValue: null,
    pValueTwoSided: null,
    resampledDeviations: null
  };
  if (n < MINIMUM_BOOTSTRAP_LENGTH) {
    return {
      state: "too-short",
      ...empty,
      relativeDifference: null,
      notes: [`series has ${n} observation(s); the bootstrap needs ${MINIMUM_BOOTSTRAP_LENGTH}`]
    };
  }
  const candidateMean = meanOf(candidateLoss);
  const baselineMean = meanOf(baselineLoss);
  if (!(baselineMean > 0)) {
    return {
      state: "baseline-zero",
      ...empty,
      relativeDifference: null,
      notes: [`the baseline's mean loss is ${baselineMean}; a relative difference needs it > 0`]
    };
  }
  const estimate = candidateMean / baselineMean - 1;
  const identical = candidateLoss.every((x, t) => x === baselineLoss[t]);
  const notes = [];
  const deviations = new Float64Array(resamples);
  const candidateDeviations = new Float64Array(resamples);
  const baselineDeviations = new Float64Array(resamples);
  if (identical) {
    notes.push("candidate and baseline losses are identical; no resampling needed");
  } else {
    const candidatePrefix = centredPrefixSums(candidateLoss, candidateMean);
    const baselinePrefix = centredPrefixSums(baselineLoss, baselineMean);
    const sampler = createGeometricSampler(expectedBlockLength);
    const blocks = allocateStationaryBlocks(n);
    let zeroDenominators = 0;
    const streams = randomStreams(random, seed, 0);
    for (let first = 0; first < resamples; first += RESAMPLES_PER_STREAM) {
      const source = streams.next();
      const last = Math.min(resamples, first + RESAMPLES_PER_STREAM);
      for (let b = first; b < last; b++) {
        drawStationaryBlocks(n, sampler, source, blocks);
        candidateDeviations[b] = resampleMeanDeviation(candidatePrefix, n, blocks);
        baselineDeviations[b] = resampleMeanDeviation(baselinePrefix, n, blocks);
        const c = candidateMean + candidateDeviations[b];
        const base = baselineMean + baselineDeviations[b];
        if (base === 0) zeroDenominators++;
        const theta = base === 0 && c === 0 ? Number.POSITIVE_INFINITY : c / base - 1;
        deviations[b] = theta - estimate;
      }
    }
    if (zeroDenominators > 0) {
      notes.push(`${zeroDenominators} resample(s) had a zero baseline mean loss (\u03B8* infinite)`);
    }
  }
  const reflected = new Float64Array(resamples);
  for (let b = 0; b < resamples; b++) reflected[b] = estimate - deviations[b];
  reflected.sort();
  const inference = basicBootstrapInference(reflected, margin, confidence);
  return {
    state: identical ? "identical" : "ok",
    ...empty,
    relativeDifference: estimate,
    standardError: sampleStandardDeviation(deviations),
    interval: { ...inference.interval, method: "basic" },
    oneSidedLower: { ...inference.oneSidedLower, method: "basic" },
    pValue: inference.pValue,
    pValueTwoSided: inference.pValueTwoSided,
    resampledDeviations: { candidate: candidateDeviations, baseline: baselineDeviations },
    notes
  };
}

// src/comparison/runBootstrap.ts
function runBootstrap(d, series, hypothesis, settings, runner, difference = d) {
  const auto = settings.blockLength.kind === "auto" && d.length >= 2 ? automaticBlockLength(difference) : null;
  const expectedBlockLength = settings.blockLength.kind === "fixed" ? settings.blockLength.length : auto?.blockLength ?? 1;
  const options = {
    resamples: settings.resamples,
    expectedBlockLength,
    seed: settings.seed,
    confidence: settings.confidence,
    margin: hypothesis.boundary
  };
  const result = stationaryBootstrap(d, options, createRandomSource, runner);
  const relative = relativeDifferenceBootstrap(series.candidate, series.baseline, {
    ...options,
    margin: hypothesis.baselineFactor - 1
  });
  const decisionPValue = hypothesis.rejectWhen === "above" ? result.pValue : result.pValueBelow;
  const summary = {
    state: result.state,
    resamples: result.resamples,
    seed: result.seed,
    expectedBlockLength,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: auto,
    standardError: result.standardError,
    interval: difference === d ? result.interval : differenceInterval(difference, relative.resampledDeviations, settings.confidence),
    relativeInterval: settings.marginKind === "relative" ? relative.interval : null,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    notes: result.notes
  };
  return { summary, resampledDeviations: relative.resampledDeviations };
}
function differenceInterval(difference, deviations, level) {
  if (deviations === null) return null;
  const centre = meanOf(difference);
  const reflected = new Float64Array(deviations.candidate.length);
  for (let b = 0; b < reflected.length; b++) {
    reflected[b] = centre - (deviations.candidate[b] - deviations.baseline[b]);
  }
  reflected.sort();
  const { interval } = basicBootstrapInference(reflected, 0, level);
  return { ...interval, method: "basic" };
}

// src/statistics/ewcCosineTermsRule.ts
var CALIBRATION_AUTOCORRELATION = 0.7;
var AUTOCORRELATION_FLOOR = 0.05;
var AUTOCORRELATION_CEILING = 0.97;
function ar1SpectralCurvature(rho) {
  return 2 * rho / (1 - rho) ** 2;
}
function ar1PluginCosineTerms(x) {
  const n = x.length;
  if (n < 4) return { terms: ewcDegreesOfFreedom(n), autocorrelation: 0, pluginAutocorrelation: 0 };
  const [gamma0, gamma1] = autocovariances(x, 1);
  const rho = gamma0 > 0 ? gamma1 / gamma0 : 0;
  const corrected = rho + (1 + 3 * rho) / n;
  const plugin = Math.min(Math.max(corrected, AUTOCORRELATION_FLOOR), AUTOCORRELATION_CEILING);
  return {
    terms: cosineTermsForAutocorrelation(n, plugin),
    autocorrelation: rho,
    pluginAutocorrelation: plugin
  };
}
function cosineTermsForAutocorrelation(n, rho) {
  const ratio = ar1SpectralCurvature(CALIBRATION_AUTOCORRELATION) / ar1SpectralCurvature(rho);
  const raw = Math.round(0.4 * n ** (2 / 3) * Math.cbrt(ratio));
  return Math.min(Math.max(2, raw), Math.max(2, Math.floor(n / 2)));
}

// src/statistics/dieboldMariano.ts
var MINIMUM_LENGTH = 3;
function dieboldMariano(d, options) {
  const { estimator: requestedEstimator, horizon, margin } = options;
  validate(d, options);
  const n = d.length;
  const base = {
    state: "ok",
    estimator: requestedEstimator,
    requestedEstimator,
    n,
    mean: n > 0 ? mean(d) : 0,
    statistic: null,
    pValue: null,
    pValueTwoSided: null,
    longRunVariance: null,
    variance: null,
    lag: null,
    degreesOfFreedom: null,
    smallSample: null,
    lagSelection: null,
    notes: []
  };
  if (n < MINIMUM_LENGTH) {
    base.state = "too-short";
    base.notes.push(
      `Only ${n} loss differential${n === 1 ? "" : "s"}; the Diebold\u2013Mariano test needs at least ${MINIMUM_LENGTH}.`
    );
    return base;
  }
  const constant = constantValue(d);
  if (constant === 0) {
    base.state = "identical";
    base.mean = 0;
    base.notes.push(
      "Every loss differential is 0: both forecasts have the same loss on every row, so there is no difference to test."
    );
    return base;
  }
  if (constant !== null) {
    base.state = "zero-variance";
    base.mean = constant;
    base.notes.push(
      `Every loss differential equals ${constant}: the differential does not vary, so its variance is 0 and the statistic is undefined.`
    );
    return base;
  }
  const gamma0 = autocovariances(d, 0)[0];
  let longRunVariance;
  let estimator = requestedEstimator;
  let lagChoice = null;
  if (requestedEstimator === "ewc" || requestedEstimator === "ewc-ar1") {
    let terms;
    if (requestedEstimator === "ewc-ar1") {
      const choice = ar1PluginCosineTerms(options.lagSeries ?? d);
      terms = choice.terms;
      base.notes.push(
        `${terms} cosine terms chosen from the first-order autocorrelation ${choice.autocorrelation.toFixed(3)} (AR(1) plug-in, Lazarus et al. 2018).`
      );
    }
    const ewc = ewcLongRunVariance(d, terms);
    longRunVariance = ewc.value;
    base.degreesOfFreedom = ewc.degreesOfFreedom;
  } else {
    lagChoice = selectLag(options.lagSeries ?? d, options.lag, horizon);
    base.notes.push(...lagChoice.notes);
    base.lag = lagChoice.lag;
    base.lagSelection = describeLagChoice(lagChoice);
    if (requestedEstimator === "bartlett") {
      longRunVariance = bartlettLongRunVariance(d, lagChoice.lag);
    } else {
      const uniform = uniformLongRunVariance(d, lagChoice.lag);
      longRunVariance = uniform.value;
      estimator = uniform.estimator;
      if (uniform.note !== null) base.notes.push(uniform.note);
    }
  }
  base.estimator = estimator;
  if (!Number.isFinite(longRunVariance)) {
    throw new RangeError(
      "dieboldMariano: the loss differentials are too large to square in double precision"
    );
  }
  base.longRunVariance = longRunVariance;
  base.variance = longRunVariance / n;
  if (isEffectivelyNonPositive(longRunVariance, gamma0, n)) {
    base.state = "zero-variance";
    base.notes.push(
      `The long-run variance estimate is ${longRunVariance.toPrecision(6)}, zero within rounding, so the statistic is undefined.`
    );
    return base;
  }
  const statistic = (base.mean - margin) / Math.sqrt(base.variance);
  if (!Number.isFinite(statistic)) {
    base.state = "zero-variance";
    base.notes.push("The variance of the mean is too small for a finite statistic.");
    return base;
  }
  base.statistic = statistic;
  if (estimator === "ewc" || estimator === "ewc-ar1") {
    const nu = base.degreesOfFreedom;
    base.pValue = studentTUpperTail(statistic, nu);
    base.pValueTwoSided = studentTTwoSided(statistic, nu);
  } else {
    base.pValue = standardNormalUpperTail(statistic);
    base.pValueTwoSided = standardNormalTwoSided(statistic);
    base.smallSample = harveyLeybourneNewbold(statistic, n, horizon);
    if (base.smallSample === null) {
      base.notes.push(
        `The small-sample correction needs the horizon (${horizon}) below n (${n}); not computed.`
      );
    }
  }
  return base;
}
function validate(d, options) {
  const { horizon, margin, lag } = options;
  if (!Number.isInteger(horizon) || horizon < 1) {
    throw new RangeError(`dieboldMariano: the horizon must be an integer \u2265 1, got ${horizon}`);
  }
  if (!Number.isFinite(margin)) {
    throw new RangeError(`dieboldMariano: the margin must be finite, got ${margin}`);
  }
  if (lag.kind === "fixed" && (!Number.isInteger(lag.lag) || lag.lag < 0)) {
    throw new RangeError(`dieboldMariano: a fixed lag must be an integer \u2265 0, got ${lag.lag}`);
  }
  for (let t = 0; t < d.length; t++) {
    if (!Number.isFinite(d[t])) {
      throw new RangeError(`dieboldMariano: loss differential ${t + 1} is ${d[t]}, not finite`);
    }
  }
}
function constantValue(d) {
  const first = d[0];
  for (let t = 1; t < d.length; t++) if (d[t] !== first) return null;
  return first === 0 ? 0 : first;
}
function describeLagChoice(choice) {
  if (choice.bandwidth === void 0) return { rule: choice.rule };
  const { pilotLag, bandwidth, s0, s1 } = choice.bandwidth;
  return { rule: choice.rule, pilotLag, bandwidth, s0, s1 };
}

// src/comparison/runDieboldMariano.ts
function runDieboldMariano(d, horizon, hypothesis, settings, difference = d) {
  const options = {
    estimator: settings.variance,
    lag: settings.lag,
    horizon,
    lagSeries: difference
  };
  const result = dieboldMariano(d, { ...options, margin: hypothesis.boundary });
  const upper = result.smallSample?.pValue ?? result.pValue;
  const decisionPValue = upper === null ? null : hypothesis.rejectWhen === "above" ? upper : 1 - upper;
  const unshifted = difference === d ? result : dieboldMariano(difference, { ...options, margin: 0 });
  return {
    state: result.state,
    estimator: result.estimator,
    requestedEstimator: result.requestedEstimator,
    statistic: result.statistic,
    pValue: result.pValue,
    pValueTwoSided: result.pValueTwoSided,
    decisionPValue,
    variance: result.variance,
    longRunVariance: result.longRunVariance,
    lag: result.lag,
    degreesOfFreedom: result.degreesOfFreedom,
    smallSample: result.smallSample,
    interval: meanInterval(unshifted, horizon, settings.confidence),
    lagSelection: result.lagSelection,
    notes: result.notes
  };
}
function meanInterval(result, horizon, level) {
  if (result.variance === null || !(result.variance > 0) || result.statistic === null) return null;
  const tail = 1 - (1 - level) / 2;
  let se = Math.sqrt(result.variance);
  let q;
  if (result.smallSample !== null) {
    se /= harveyLeybourneNewboldFactor(result.n, horizon) ?? 1;
    q = studentTQuantile(tail, result.smallSample.degreesOfFreedom);
  } else if (result.degreesOfFreedom !== null) {
    q = studentTQuantile(tail, result.degreesOfFreedom);
  } else {
    q = standardNormalQuantile(tail);
  }
  return {
    level,
    lower: result.mean - q * se,
    upper: result.mean + q * se,
    method: result.smallSample !== null ? "HLN-corrected t" : result.degreesOfFreedom !== null ? "fixed-b t" : "normal"
  };
}

// src/comparison/compareLossSeries.ts
function compareLossSeries(series, scope2, hypothesis, settings, options = {}) {
  const n = series.baseline.length;
  const meanBaselineLoss = meanOrZero(series.baseline);
  const meanCandidateLoss = meanOrZero(series.candidate);
  const d = lossDifferential(series, hypothesis.baselineFactor - 1);
  const difference = hypothesis.baselineFactor === 1 ? d : lossDifferential(series, 0);
  const meanTestedDifferential = meanOrZero(d);
  const identicalLosses = series.baseline.every((b, t) => b === series.candidate[t]);
  const dieboldMariano2 = runDieboldMariano(
    d,
    series.maxHorizon,
    hypothesis,
    settings,
    difference
  );
  const withBootstrap = options.bootstrap ?? true;
  const bootstrapRun = withBootstrap ? runBootstrap(d, series, hypothesis, settings, options.runner, difference) : null;
  const bootstrap = bootstrapRun?.summary ?? bootstrapNotRun(settings);
  const decision = decideComparison({
    hypothesis,
    alpha: settings.alpha,
    agreement: withBootstrap ? settings.agreement : "dm",
    dieboldMariano: {
      label: `Diebold\u2013Mariano (${dieboldMariano2.estimator})`,
      pValue: dieboldMariano2.decisionPValue,
      mean: meanTestedDifferential,
      state: dieboldMariano2.state
    },
    bootstrap: {
      label: "Stationary bootstrap",
      pValue: bootstrap.decisionPValue,
      mean: meanTestedDifferential,
      state: bootstrap.state
    },
    n,
    minPoints: settings.minPoints,
    shortData: settings.shortData,
    identicalLosses
  });
  const first = series.time[0];
  const last = series.time[n - 1];
  return {
    loss: scope2.loss,
    horizon: scope2.horizon,
    series: scope2.series,
    ...scope2.path === void 0 ? {} : { path: scope2.path },
    n,
    rows: series.rowCount,
    maxHorizon: series.maxHorizon,
    firstTimestamp: first === void 0 ? null : scope2.timestamps[first] ?? null,
    lastTimestamp: last === void 0 ? null : scope2.timestamps[last] ?? null,
    meanBaselineLoss,
    meanCandidateLoss,
    meanDifference: meanCandidateLoss - meanBaselineLoss,
    relativeDifference: meanBaselineLoss === 0 ? null : meanCandidateLoss / meanBaselineLoss - 1,
    meanTestedDifferential,
    relativeChange: relativeChange({
      series,
      settings,
      agreement: withBootstrap ? settings.agreement : "dm",
      dieboldMariano: dieboldMariano2,
      bootstrap: {
        state: bootstrap.state,
        resampledDeviations: bootstrapRun?.resampledDeviations ?? null
      }
    }),
    dieboldMariano: dieboldMariano2,
    bootstrap,
    verdict: decision.verdict,
    reasons: decision.reasons,
    rejected: decision.rejected
  };
}
function meanOrZero(x) {
  return x.length === 0 ? 0 : mean(x);
}
function bootstrapNotRun(settings) {
  return {
    state: "not-run",
    resamples: 0,
    seed: settings.seed,
    expectedBlockLength: 1,
    blockLengthRule: settings.blockLength.kind,
    blockLengthSelection: null,
    standardError: null,
    interval: null,
    relativeInterval: null,
    pValue: null,
    pValueTwoSided: null,
    decisionPValue: null,
    notes: [
      "not run for per-series comparisons (the Diebold\u2013Mariano test with adjusted p-values locates them)"
    ]
  };
}

// src/stability/recentWindow.ts
function parseRecentWindow(text, label) {
  if (text === "") return null;
  const percent = /^(\d+(?:\.\d+)?)%$/.exec(text);
  if (percent !== null) {
    const share = Number(percent[1]) / 100;
    if (share > 0 && share < 1) return { kind: "share", share };
  } else if (/^\d+$/.test(text)) {
    const points = Number(text);
    if (Number.isSafeInteger(points) && points >= 2) return { kind: "points", points };
  }
  throw new InputError(
    `${label} must be a number of time points (an integer \u2265 2) or a percentage such as 15%`,
    { value: text }
  );
}
function recentPoints(window2, n) {
  const k = window2.kind === "points" ? window2.points : Math.ceil(window2.share * n - 1e-9);
  return Math.min(n, Math.max(k, 0));
}

// src/stability/recentComparison.ts
function lastPoints(series, count) {
  const from = series.baseline.length - count;
  const rows = series.rows.subarray(from);
  let rowCount = 0;
  for (let t = 0; t < rows.length; t++) rowCount += rows[t];
  return {
    time: series.time.subarray(from),
    baseline: series.baseline.subarray(from),
    candidate: series.candidate.subarray(from),
    rows,
    rowCount,
    maxHorizon: series.maxHorizon
  };
}
function recentComparison(series, window2, scope2, hypothesis, settings, runner) {
  const count = recentPoints(window2, series.baseline.length);
  return compareLossSeries(
    lastPoints(series, count),
    scope2,
    hypothesis,
    settings,
    runner === void 0 ? {} : { runner }
  );
}

// src/stability/assessStability.ts
function assessStability(inputs) {
  const { series, timestamps, settings } = inputs;
  const label = (i) => timestamps[series.time[i]] ?? String(i);
  const { periods } = periodBreakdown(series, timestamps, inputs.kind);
  const worse = hypothesisFor("no-regression", settings.margin, settings.marginKind);
  const d = lossDifferential(series, worse.baselineFactor - 1);
  if (worse.boundary !== 0) for (let t = 0; t < d.length; t++) d[t] -= worse.boundary;
  const test = fluctuationTest(d, {
    mu: settings.fluctuationWindow,
    alpha: settings.alpha,
    sides: settings.fluctuationSides,
    lag: settings.lag,
    horizon: series.maxHorizon
  });
  const fluctuation = test === null ? null : {
    statistic: test.statistic,
    criticalValue: test.criticalValue,
    mu: settings.fluctuationWindow,
    windowSize: test.windowSize,
    rejected: test.rejected,
    peak: {
      start: label(test.peakWindow),
      end: label(test.peakWindow + test.windowSize - 1)
    },
    worsePeriods: test.worseRuns.map(([from, to]) => ({
      start: label(from),
      end: label(to)
    }))
  };
  const recent = settings.recent === null || series.baseline.length === 0 ? null : recentComparison(
    series,
    settings.recent,
    { loss: settings.loss, horizon: "all", series: "all", timestamps },
    inputs.hypothesis,
    settings,
    inputs.runner
  );
  return { fluctuation, recent, periods };
}

// src/comparison/evaluateLossSeries.ts
function evaluateLossSeries(series, source, settings, resampleRunner) {
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = resampleRunner === void 0 ? {} : { runner: resampleRunner };
  const overall = compareLossSeries(
    series,
    { loss: settings.loss, horizon: "all", series: "all", timestamps: source.timestamps },
    hypothesis,
    settings,
    runner
  );
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: lossFileInputsSummary(source.file, source.timestamps, source.kind, series.maxHorizon),
    comparisons: [overall],
    stability: assessStability({
      series,
      timestamps: source.timestamps,
      kind: source.kind,
      hypothesis,
      settings,
      ...runner
    })
  });
}

// src/decision/decideAdjusted.ts
function decideAdjusted(input) {
  const { hypothesis, alpha, adjustedPValue: p } = input;
  const name = input.method === "holm" ? "Holm-adjusted" : "Benjamini\u2013Hochberg-adjusted";
  if (p === null) {
    return {
      verdict: "warn",
      reasons: ["The Diebold\u2013Mariano test could not be computed for this series."],
      rejected: null
    };
  }
  const rejected = p <= alpha;
  const onKeep = hypothesis.onReject === "fail" ? "pass" : "fail";
  const text = formatPValue(p);
  const shown = text.startsWith("<") ? `p ${text}` : `p = ${text}`;
  const reasons = [
    `${name} Diebold\u2013Mariano ${shown} ${rejected ? "\u2264" : ">"} \u03B1 = ${alpha}: ${rejected ? "evidence" : "no evidence"} that ${hypothesis.alternative}.`
  ];
  let verdict = rejected ? hypothesis.onReject : onKeep;
  if (input.n < input.minPoints) {
    verdict = "warn";
    reasons.push(`Too little data: ${input.n} time points, fewer than ${input.minPoints}.`);
  }
  return { verdict, reasons, rejected };
}

// src/losses/absoluteError.ts
function absoluteError(actual, prediction) {
  return Math.abs(actual - prediction);
}

// src/losses/absolutePercentageError.ts
function absolutePercentageError(actual, prediction) {
  return 100 * Math.abs(actual - prediction) / Math.abs(actual);
}

// src/losses/intervalCoverage.ts
function intervalCoverage(actual, lower, upper) {
  const n = actual.length;
  if (lower.length !== n || upper.length !== n) {
    throw new RangeError(
      `intervalCoverage: ${n} actuals, ${lower.length} lower and ${upper.length} upper bounds`
    );
  }
  if (n === 0) return null;
  let inside = 0;
  for (let i = 0; i < n; i++) {
    const y = actual[i];
    if (lower[i] <= y && y <= upper[i]) inside++;
  }
  return inside / n;
}

// src/losses/intervalScore.ts
function intervalScore(actual, lower, upper, alpha) {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`intervalScore: \u03B1 must be in (0, 1), got ${alpha}`);
  }
  const penalty = 2 / alpha;
  let score = upper - lower;
  if (actual < lower) score += penalty * (lower - actual);
  if (actual > upper) score += penalty * (actual - upper);
  return score;
}

// src/losses/pinballLoss.ts
function pinballLoss(actual, quantile, level) {
  const u = actual - quantile;
  return u >= 0 ? level * u : (level - 1) * u;
}

// src/losses/squaredError.ts
function squaredError(actual, prediction) {
  const e = actual - prediction;
  return e * e;
}

// src/losses/symmetricAbsolutePercentageError.ts
function symmetricAbsolutePercentageError(actual, prediction) {
  const denominator = Math.abs(actual) + Math.abs(prediction);
  return denominator === 0 ? 0 : 200 * Math.abs(actual - prediction) / denominator;
}

// src/losses/rowLosses.ts
var LossUnavailableError = class extends Error {
};
var POINT_LOSSES = {
  squared: squaredError,
  absolute: absoluteError,
  ape: absolutePercentageError,
  sape: symmetricAbsolutePercentageError
};
function computeRowLosses(panel, loss, zeroActuals, interval = null) {
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  if (loss === "interval") return intervalLosses(panel, interval);
  if (loss === "pinball") {
    const pairs = commonQuantiles(panel.baseline.quantiles, panel.candidate.quantiles);
    if (pairs.length === 0) {
      throw new LossUnavailableError(
        "the pinball loss needs quantile columns (such as q0.1, q0.5, q0.9) with the same levels in baseline and candidate"
      );
    }
    const y2 = panel.actual;
    for (const { level, base: base2, cand: cand2 } of pairs) {
      for (let i = 0; i < n; i++) {
        const yi = y2[i];
        baseline[i] += pinballLoss(yi, base2[i], level);
        candidate[i] += pinballLoss(yi, cand2[i], level);
      }
    }
    const k = pairs.length;
    for (let i = 0; i < n; i++) {
      baseline[i] /= k;
      candidate[i] /= k;
    }
    return {
      loss,
      baseline,
      candidate,
      included: null,
      zeroActualRows: [],
      levels: pairs.map((p) => p.level),
      coverage: null
    };
  }
  const base = panel.baseline.prediction;
  const cand = panel.candidate.prediction;
  if (base === null || cand === null) {
    throw new LossUnavailableError(
      `the ${loss} loss needs a prediction column in both baseline and candidate`
    );
  }
  const f = POINT_LOSSES[loss];
  const y = panel.actual;
  const zeroActualRows = [];
  let included = null;
  for (let i = 0; i < n; i++) {
    const yi = y[i];
    if (loss === "ape" && yi === 0) {
      zeroActualRows.push(i);
      if (zeroActuals === "skip") {
        included ??= new Uint8Array(n).fill(1);
        included[i] = 0;
      }
      continue;
    }
    baseline[i] = f(yi, base[i]);
    candidate[i] = f(yi, cand[i]);
  }
  return { loss, baseline, candidate, included, zeroActualRows, levels: [], coverage: null };
}
function intervalLosses(panel, interval) {
  if (interval === null) {
    throw new LossUnavailableError(
      "the interval loss needs the two quantile levels of the interval"
    );
  }
  const [lowLevel, highLevel] = interval;
  const find = (columns, level) => columns.find((q) => Math.abs(q.level - level) < 1e-12)?.values;
  const bl = find(panel.baseline.quantiles, lowLevel);
  const bu = find(panel.baseline.quantiles, highLevel);
  const cl = find(panel.candidate.quantiles, lowLevel);
  const cu = find(panel.candidate.quantiles, highLevel);
  if (bl === void 0 || bu === void 0 || cl === void 0 || cu === void 0) {
    throw new LossUnavailableError(
      `the interval loss needs quantile columns at levels ${lowLevel} and ${highLevel} in baseline and candidate`
    );
  }
  const alpha = 1 - (highLevel - lowLevel);
  const n = panel.size;
  const baseline = new Float64Array(n);
  const candidate = new Float64Array(n);
  const y = panel.actual;
  for (let i = 0; i < n; i++) {
    baseline[i] = intervalScore(y[i], bl[i], bu[i], alpha);
    candidate[i] = intervalScore(y[i], cl[i], cu[i], alpha);
  }
  return {
    loss: "interval",
    baseline,
    candidate,
    included: null,
    zeroActualRows: [],
    levels: [lowLevel, highLevel],
    coverage: {
      nominal: highLevel - lowLevel,
      baseline: intervalCoverage(y, bl, bu),
      candidate: intervalCoverage(y, cl, cu)
    }
  };
}
function commonQuantiles(baseline, candidate) {
  const byLevel = new Map(candidate.map((q) => [q.level, q.values]));
  const pairs = [];
  for (const q of baseline) {
    const cand = byLevel.get(q.level);
    if (cand !== void 0) pairs.push({ level: q.level, base: q.values, cand });
  }
  return pairs;
}

// src/multiplicity/testFamily.ts
function testFamily(pValues, what) {
  const positions = [];
  const values = [];
  pValues.forEach((p, i) => {
    if (p === null) return;
    if (typeof p !== "number" || !(p >= 0 && p <= 1)) {
      throw new RangeError(`${what}: p-value ${i + 1} is ${p}, not a number in [0, 1]`);
    }
    positions.push(i);
    values.push(p);
  });
  return { positions, values };
}
function ascendingOrder(values) {
  return values.map((_, i) => i).sort((a, b) => values[a] - values[b] || a - b);
}

// src/multiplicity/benjaminiHochbergAdjust.ts
function benjaminiHochbergAdjust(pValues) {
  const { positions, values } = testFamily(pValues, "benjaminiHochbergAdjust");
  const m = values.length;
  const adjusted = pValues.map(() => null);
  const order = ascendingOrder(values);
  let running = 1;
  for (let i = m - 1; i >= 0; i--) {
    const k = order[i];
    running = Math.min(running, m / (i + 1) * values[k]);
    adjusted[positions[k]] = running;
  }
  return adjusted;
}

// src/multiplicity/holmAdjust.ts
function holmAdjust(pValues) {
  const { positions, values } = testFamily(pValues, "holmAdjust");
  const m = values.length;
  const adjusted = pValues.map(() => null);
  let running = 0;
  ascendingOrder(values).forEach((k, i) => {
    running = Math.max(running, Math.min(1, (m - i) * values[k]));
    adjusted[positions[k]] = running;
  });
  return adjusted;
}

// src/scaling/seriesScale.ts
function scaleFromSum(sum, terms, what) {
  if (terms === 0) {
    return { state: "too-short", value: null, terms, note: `the ${what} has no terms` };
  }
  const value = sum / terms;
  if (!Number.isFinite(value)) {
    throw new RangeError(`the ${what} is ${value}, too large for double precision`);
  }
  if (value === 0) {
    return {
      state: "zero",
      value: null,
      terms,
      note: `the ${what} is 0 over ${terms} term${terms === 1 ? "" : "s"}, so it cannot scale`
    };
  }
  return { state: "ok", value, terms, note: null };
}

// src/scaling/baselineMeanLossScale.ts
function baselineMeanLossScale(seriesNames, series, baselineLoss, included = null) {
  const n = series.length;
  if (baselineLoss.length !== n || included !== null && included.length !== n) {
    throw new RangeError(
      `baselineMeanLossScale: ${n} series indices, ${baselineLoss.length} losses` + (included === null ? "" : `, ${included.length} inclusion flags`)
    );
  }
  const k = seriesNames.length;
  const sum = new Float64Array(k);
  const count = new Int32Array(k);
  for (let i = 0; i < n; i++) {
    if (included !== null && included[i] === 0) continue;
    const s = series[i];
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `baselineMeanLossScale: row ${i + 1} has series index ${s}, not 0..${k - 1}`
      );
    }
    const loss = baselineLoss[i];
    if (!(loss >= 0 && Number.isFinite(loss))) {
      throw new RangeError(`baselineMeanLossScale: row ${i + 1} has baseline loss ${loss}`);
    }
    sum[s] += loss;
    count[s]++;
  }
  const scales = /* @__PURE__ */ new Map();
  seriesNames.forEach((name, s) => {
    scales.set(name, scaleFromSum(sum[s], count[s], "mean baseline loss"));
  });
  return scales;
}

// src/scaling/scaleLossesBySeries.ts
function scaleLossesBySeries(seriesNames, series, baseline, candidate, scales) {
  const n = series.length;
  if (baseline.length !== n || candidate.length !== n) {
    throw new RangeError(
      `scaleLossesBySeries: ${n} series indices, ${baseline.length} baseline and ${candidate.length} candidate losses`
    );
  }
  const k = seriesNames.length;
  const used = new Uint8Array(k);
  for (let i = 0; i < n; i++) {
    const s = series[i];
    if (!(s >= 0 && s < k)) {
      throw new RangeError(
        `scaleLossesBySeries: row ${i + 1} has series index ${s}, not 0..${k - 1}`
      );
    }
    used[s] = 1;
  }
  const divisor = new Float64Array(k);
  const missing = [];
  seriesNames.forEach((name, s) => {
    if (used[s] === 0) return;
    const scale = scales.get(name);
    if (scale === void 0) {
      missing.push({ series: name, state: "absent", note: "no scale was given for this series" });
    } else if (scale.state !== "ok" || scale.value === null) {
      const state = scale.state === "ok" ? "zero" : scale.state;
      missing.push({ series: name, state, note: scale.note ?? "the scale is not usable" });
    } else {
      divisor[s] = scale.value;
    }
  });
  if (missing.length > 0) return { state: "unavailable", missing };
  const scaledBaseline = new Float64Array(n);
  const scaledCandidate = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const c = divisor[series[i]];
    scaledBaseline[i] = baseline[i] / c;
    scaledCandidate[i] = candidate[i] / c;
  }
  return { state: "ok", baseline: scaledBaseline, candidate: scaledCandidate };
}

// src/scaling/seasonalNaiveScale.ts
function seasonalNaiveScaleOf(history, period, loss) {
  if (!Number.isInteger(period) || period < 1) {
    throw new RangeError(`seasonalNaiveScale: the period must be an integer \u2265 1, got ${period}`);
  }
  const n = history.length;
  for (let t = 0; t < n; t++) {
    if (!Number.isFinite(history[t])) {
      throw new RangeError(`seasonalNaiveScale: value ${t + 1} is ${history[t]}, not finite`);
    }
  }
  let sum = 0;
  for (let t = period; t < n; t++) {
    const e = history[t] - history[t - period];
    sum += loss === "absolute" ? Math.abs(e) : e * e;
  }
  const what = loss === "absolute" ? `mean absolute seasonal naive error (period ${period})` : `mean squared seasonal naive error (period ${period})`;
  return scaleFromSum(sum, Math.max(0, n - period), what);
}
function seasonalNaiveScale(histories, period, loss) {
  const scales = /* @__PURE__ */ new Map();
  for (const [name, history] of histories) {
    try {
      scales.set(name, seasonalNaiveScaleOf(history, period, loss));
    } catch (error) {
      if (error instanceof RangeError) {
        throw new RangeError(`series ${JSON.stringify(name)}: ${error.message}`);
      }
      throw error;
    }
  }
  return scales;
}

// src/comparison/evaluatePanel.ts
function evaluatePanel(panel, settings, extras = {}) {
  const losses = rowLossesOrInputError(panel, settings);
  const pooled = settings.pooling === "scaled" ? scaledLosses(panel, losses, settings, extras) : losses;
  const weights = settings.weights ? weightsOrInputError(panel, settings) : null;
  const hypothesis = hypothesisFor(settings.policy, settings.margin, settings.marginKind);
  const runner = extras.resampleRunner === void 0 ? {} : { runner: extras.resampleRunner };
  const scope2 = (horizon, series) => ({
    loss: settings.loss,
    horizon,
    series,
    timestamps: panel.timestamps
  });
  const overallSeries = aggregateByTime(panel, pooled, void 0, weights);
  const comparisons = [
    compareLossSeries(overallSeries, scope2("all", "all"), hypothesis, settings, runner)
  ];
  const byHorizon = groupRows(panel.horizon);
  if (byHorizon.size > 1) {
    for (const h of [...byHorizon.keys()].sort((a, b) => a - b)) {
      const series = aggregateByTime(panel, pooled, byHorizon.get(h), weights);
      comparisons.push(compareLossSeries(series, scope2(h, "all"), hypothesis, settings, runner));
    }
  }
  let pathSummary = null;
  if (panel.path !== null && panel.paths.length > 1) {
    const byPath = groupRows(panel.path);
    const perPath = panel.paths.map(
      (name, id) => compareLossSeries(
        aggregateByTime(panel, pooled, byPath.get(id) ?? [], weights),
        { ...scope2("all", "all"), path: name },
        hypothesis,
        settings,
        { bootstrap: false }
      )
    );
    comparisons.push(...perPath);
    const worse = perPath.filter((c) => c.meanDifference > 0).length;
    pathSummary = {
      paths: perPath.length,
      worse,
      shareWorse: worse / perPath.length,
      significantlyWorse: perPath.filter((c) => {
        const p = c.dieboldMariano.smallSample?.pValue ?? c.dieboldMariano.pValue;
        return p !== null && p <= settings.alpha;
      }).length
    };
  }
  let seriesSummary = null;
  if (panel.seriesNames.length > 1) {
    const perSeries = seriesComparisons(panel, losses, weights, hypothesis, settings, scope2);
    comparisons.push(...perSeries.comparisons);
    seriesSummary = perSeries.summary;
  }
  return buildReport({
    version: VERSION,
    settings,
    hypothesis,
    inputs: panelInputsSummary(panel, losses),
    comparisons,
    seriesSummary,
    pathSummary,
    ...extras.integrity === void 0 ? {} : { integrity: extras.integrity },
    stability: assessStability({
      series: overallSeries,
      timestamps: panel.timestamps,
      kind: panel.timestampKind,
      hypothesis,
      settings,
      ...runner
    })
  });
}
function seriesComparisons(panel, losses, weights, hypothesis, settings, scope2) {
  const k = panel.seriesNames.length;
  const rowsOf = groupRows(panel.series);
  const raw = panel.seriesNames.map((name, id) => {
    const series = aggregateByTime(panel, losses, rowsOf.get(id) ?? [], weights);
    return compareLossSeries(series, scope2("all", name), hypothesis, settings, {
      bootstrap: false
    });
  });
  const adjust = settings.adjust === "holm" ? holmAdjust : benjaminiHochbergAdjust;
  const upper = raw.map((c) => c.dieboldMariano.smallSample?.pValue ?? c.dieboldMariano.pValue);
  const worseP = adjust(upper);
  const betterP = adjust(upper.map((p) => p === null ? null : 1 - p));
  const policyP = hypothesis.rejectWhen === "above" ? worseP : betterP;
  let worse = 0;
  let better = 0;
  const comparisons = raw.map((c, j) => {
    const w = worseP[j] ?? null;
    const b = betterP[j] ?? null;
    const direction = w !== null && w <= settings.alpha ? "worse" : b !== null && b <= settings.alpha ? "better" : "no evidence";
    if (direction === "worse") worse++;
    if (direction === "better") better++;
    const decision = decideAdjusted({
      hypothesis,
      alpha: settings.alpha,
      adjustedPValue: policyP[j] ?? null,
      method: settings.adjust,
      n: c.n,
      minPoints: settings.minPoints
    });
    return {
      ...c,
      verdict: decision.verdict,
      reasons: decision.reasons,
      rejected: { dieboldMariano: decision.rejected, bootstrap: null },
      adjustedPValue: policyP[j] ?? null,
      direction
    };
  });
  const top = comparisons.filter((c) => c.direction === "worse").sort(
    (a, b) => (b.relativeDifference ?? b.meanDifference) - (a.relativeDifference ?? a.meanDifference)
  ).slice(0, settings.top).map((c) => c.series);
  return {
    comparisons,
    summary: {
      method: settings.adjust,
      alpha: settings.alpha,
      series: k,
      worse,
      better,
      noEvidence: k - worse - better,
      topRegressions: top
    }
  };
}
function groupRows(values) {
  const groups = /* @__PURE__ */ new Map();
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    let list = groups.get(v);
    if (list === void 0) {
      list = [];
      groups.set(v, list);
    }
    list.push(i);
  }
  return groups;
}
function scaledLosses(panel, losses, settings, extras) {
  let scales;
  if (settings.scale === "baseline") {
    scales = baselineMeanLossScale(
      panel.seriesNames,
      panel.series,
      losses.baseline,
      losses.included
    );
  } else {
    if (extras.history === void 0) {
      throw new InputError(
        "the seasonal-naive scale needs a history file (series, timestamp, actual)",
        {
          file: "history"
        }
      );
    }
    const lossKind = settings.loss === "squared" ? "squared" : "absolute";
    scales = seasonalNaiveScale(extras.history, settings.season, lossKind);
  }
  const scaled = scaleLossesBySeries(
    panel.seriesNames,
    panel.series,
    losses.baseline,
    losses.candidate,
    scales
  );
  if (scaled.state === "unavailable") {
    const first = scaled.missing[0];
    throw new InputError(
      `pooling scaled losses needs a positive scale for every series; ${scaled.missing.length} series lack one, first ${JSON.stringify(first.series)}: ${first.note}`,
      { file: settings.history ?? settings.baseline, value: first.series }
    );
  }
  return { ...losses, baseline: scaled.baseline, candidate: scaled.candidate };
}
function weightsOrInputError(panel, settings) {
  if (panel.weight === null) {
    throw new InputError("weights were asked for, but the files have no weight column", {
      file: settings.actuals ?? settings.baseline,
      column: settings.columns.weight ?? "weight"
    });
  }
  return panel.weight;
}
function rowLossesOrInputError(panel, settings) {
  let losses;
  try {
    losses = computeRowLosses(panel, settings.loss, settings.zeroActuals, settings.interval);
  } catch (error) {
    if (error instanceof LossUnavailableError) {
      throw new InputError(`loss ${settings.loss}: ${error.message}`, {
        file: `${settings.baseline}, ${settings.candidate}`
      });
    }
    throw error;
  }
  if (settings.zeroActuals === "error" && losses.zeroActualRows.length > 0) {
    const row = losses.zeroActualRows[0];
    throw new InputError(
      `the absolute percentage error is undefined where the actual is 0 (${losses.zeroActualRows.length} rows, this the first; series ${JSON.stringify(
        panel.seriesNames[panel.series[row]]
      )}, timestamp ${JSON.stringify(panel.timestamps[panel.time[row]])}); use zero-actuals skip to leave them out and count them, or another loss`,
      {
        file: panel.actualSource.file,
        line: panel.actualSource.lines[row],
        column: settings.columns.actual ?? "actual",
        value: "0"
      }
    );
  }
  return losses;
}

// src/integrity/panelRowKey.ts
function describePanelRow(panel, p) {
  const parts = [];
  if (panel.seriesNames.length > 1 || panel.seriesNames[0] !== "") {
    parts.push(`series=${panel.seriesNames[panel.series[p]]}`);
  }
  parts.push(`timestamp=${panel.timestamps[panel.time[p]]}`);
  parts.push(`horizon=${panel.horizon[p]}`);
  if (panel.origin !== null) parts.push(`origin=${panel.origins[panel.origin[p]]}`);
  if (panel.path !== null) parts.push(`path=${panel.paths[panel.path[p]]}`);
  return parts.join(" ");
}

// src/integrity/exactPredictions.ts
var EXACT_TOLERANCE = 1e-9;
var EXACT_RULE = { MIN_ROWS: 5, MIN_SHARE_GAP: 0.05, RATIO: 5 };
function isExact(prediction, actual) {
  return Math.abs(prediction - actual) <= EXACT_TOLERANCE * Math.max(Math.abs(prediction), Math.abs(actual));
}
function checkExactPredictions(panel) {
  const b = panel.baseline.prediction;
  const c = panel.candidate.prediction;
  if (b === null || c === null) {
    return {
      findings: [],
      notRun: [{ id: "exact-predictions", reason: "the models have no point forecasts in common" }]
    };
  }
  const exactB = new FindingCollector();
  const exactC = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const a = panel.actual[p];
    if (isExact(b[p], a)) exactB.add(() => `baseline: ${describePanelRow(panel, p)}`);
    if (isExact(c[p], a)) exactC.add(() => `candidate: ${describePanelRow(panel, p)}`);
  }
  const n = panel.size;
  const shareB = exactB.count / n;
  const shareC = exactC.count / n;
  const flagged = (mine, share, other) => mine.count >= EXACT_RULE.MIN_ROWS && share - other >= EXACT_RULE.MIN_SHARE_GAP && share >= EXACT_RULE.RATIO * other;
  const flagB = flagged(exactB, shareB, shareC);
  const flagC = flagged(exactC, shareC, shareB);
  const pct = (x) => `${(x * 100).toFixed(2)}%`;
  const shares = `candidate ${exactC.count} (${pct(shareC)}), baseline ${exactB.count} (${pct(shareB)})`;
  let count = 0;
  let examples = [];
  let summary = `rows where the prediction equals the actual (to 1e-9 relative), of ${n}: ${shares}; no model stands out`;
  if (flagC || flagB) {
    const who = flagC && flagB ? "both models" : flagC ? "the candidate" : "the baseline";
    count = (flagC ? exactC.count : 0) + (flagB ? exactB.count : 0);
    examples = [...flagC ? exactC.examples : [], ...flagB ? exactB.examples : []].slice(0, 5);
    summary = `${who} reproduce${flagC && flagB ? "" : "s"} the actual far more often than the other model, a sign of target leakage: ${shares} of ${n} rows`;
  }
  return { findings: [{ id: "exact-predictions", count, examples, summary }], notRun: [] };
}

// src/integrity/frequency.ts
var UNITS = {
  s: { unit: "second", factor: 1 },
  min: { unit: "second", factor: 60 },
  h: { unit: "second", factor: 3600 },
  d: { unit: "day", factor: 1 },
  bd: { unit: "businessDay", factor: 1 },
  w: { unit: "day", factor: 7 },
  mo: { unit: "month", factor: 1 },
  q: { unit: "month", factor: 3 },
  y: { unit: "month", factor: 12 }
};
var FREQUENCY_SYNTAX = "auto, a count and unit (s, min, h, d, bd, w, mo, q, y), e.g. 1h, 15min, 1d, 1bd, 1w, 1mo, or a number > 0 for numeric timestamps";
function parseFrequency(text) {
  const m = /^(\d{1,6})(s|min|h|d|bd|w|mo|q|y)$/.exec(text);
  if (m !== null) {
    const count = Number(m[1]);
    const { unit, factor } = UNITS[m[2]];
    return count > 0 ? { unit, size: count * factor } : null;
  }
  if (!/^\d*\.?\d+(?:[eE][-+]?\d+)?$/.test(text)) return null;
  const size = Number(text);
  return Number.isFinite(size) && size > 0 ? { unit: "number", size } : null;
}
function formatFrequency(f) {
  switch (f.unit) {
    case "number":
      return String(f.size);
    case "second":
      if (f.size % 3600 === 0) return `${f.size / 3600}h`;
      if (f.size % 60 === 0) return `${f.size / 60}min`;
      return `${f.size}s`;
    case "day":
      return f.size % 7 === 0 ? `${f.size / 7}w` : `${f.size}d`;
    case "businessDay":
      return `${f.size}bd`;
    case "month":
      return f.size % 12 === 0 ? `${f.size / 12}y` : `${f.size}mo`;
  }
}

// src/integrity/timePoint.ts
var INSTANT_KEY = /^(\d{13})\.(\d{9})$/;
var WRITTEN_FIELDS = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2}))?)?/;
function toTimePoint(label, kind) {
  const reading = readLabel(label);
  if (typeof reading === "string" || reading.kind !== kind) return null;
  if (reading.kind === "number") {
    return {
      seconds: reading.key,
      nanos: 0,
      wallDay: 0,
      wallSecond: 0,
      month: 0,
      dayOfMonth: 0,
      monthLength: 0
    };
  }
  if (reading.kind !== "datetime") return null;
  const instant = INSTANT_KEY.exec(reading.key);
  const written = WRITTEN_FIELDS.exec(label);
  if (instant === null || written === null) {
    throw new Error(`cannot take the instant and written date of ${JSON.stringify(label)}`);
  }
  const seconds = Number(instant[1]) - 1e12;
  const nanos = Number(instant[2]);
  const year = Number(written[1]);
  const month = Number(written[2]);
  const day = Number(written[3]);
  const wallSecond = written[4] === void 0 ? 0 : Number(written[4]) * 3600 + Number(written[5]) * 60 + (written[6] === void 0 ? 0 : Number(written[6])) + nanos / 1e9;
  return {
    seconds,
    nanos,
    wallDay: daysFromCivil(year, month, day),
    wallSecond,
    month: year * 12 + month - 1,
    dayOfMonth: day,
    monthLength: lengthOfMonth(year, month)
  };
}
function compareTimePoints(a, b) {
  return a.seconds - b.seconds || a.nanos - b.nanos;
}
function timePointsOf(labels, kind) {
  return labels.map((label) => toTimePoint(label, kind));
}
function lengthOfMonth(year, month) {
  if (month === 2) return year % 4 === 0 && year % 100 !== 0 || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

// src/integrity/stepCount.ts
var SLACK = 1e-9;
function stepsAhead(from, target, f) {
  if (compareTimePoints(target, from) <= 0) return 0;
  switch (f.unit) {
    case "number":
    case "second": {
      const diff = target.seconds - from.seconds + (target.nanos - from.nanos) / 1e9;
      return Math.max(0, Math.ceil(diff / f.size - SLACK));
    }
    case "day": {
      const days = target.wallDay - from.wallDay;
      const later = target.wallSecond > from.wallSecond;
      return gridCount(later ? days : days - 1, f.size);
    }
    case "businessDay": {
      const later = target.wallSecond > from.wallSecond && isWeekday(from.wallDay);
      const n = weekdaysUpTo(target.wallDay) - weekdaysUpTo(from.wallDay) + (later ? 1 : 0);
      return gridCount(n - 1, f.size);
    }
    case "month": {
      const months = target.month - from.month;
      const day = Math.min(target.dayOfMonth, from.monthLength);
      const later = day > from.dayOfMonth || day === from.dayOfMonth && target.wallSecond > from.wallSecond;
      return gridCount(later ? months : months - 1, f.size);
    }
  }
}
function gridCount(span, size) {
  return span < 0 ? 0 : Math.floor(span / size) + 1;
}
function isWeekday(day) {
  const weekday = ((day + 4) % 7 + 7) % 7;
  return weekday !== 0 && weekday !== 6;
}
function weekdaysUpTo(day) {
  const m = day - 4;
  const weeks = Math.floor(m / 7);
  const r = m - 7 * weeks;
  return 5 * weeks + Math.min(r + 1, 5);
}

// src/integrity/foldChecks.ts
function checkFolds(input) {
  const { panel, layout } = input;
  const kind = panel.timestampKind;
  if (kind === "text") {
    throw new InputError(
      "--folds needs timestamps that are all numbers or all ISO 8601 date-times; these are in text order",
      { file: layout.file }
    );
  }
  const folds = /* @__PURE__ */ new Map();
  for (const s of layout.segments) {
    const point = (label, column) => {
      const p = toTimePoint(label, kind);
      if (p === null) {
        throw new InputError(
          `${column} is not a ${kind === "number" ? "number" : "ISO 8601 date-time"} like the predictions' timestamps`,
          { file: layout.file, line: s.line, column, value: label }
        );
      }
      return p;
    };
    const from = point(s.start, "start");
    const to = point(s.end, "end");
    if (compareTimePoints(from, to) > 0) {
      throw new InputError(`the segment ends (${s.end}) before it starts (${s.start})`, {
        file: layout.file,
        line: s.line,
        value: s.end
      });
    }
    let fold = folds.get(s.fold);
    if (fold === void 0) {
      fold = { train: [], test: [] };
      folds.set(s.fold, fold);
    }
    fold[s.role].push({ ...s, from, to });
  }
  for (const [name, fold] of folds) {
    if (fold.test.length === 0) {
      const line = fold.train[0].line;
      throw new InputError(`fold "${name}" has no test segment`, {
        file: layout.file,
        line,
        value: name
      });
    }
  }
  const findings = [];
  const notRun = [];
  let maxHorizon = 1;
  for (let p = 0; p < panel.size; p++) maxHorizon = Math.max(maxHorizon, panel.horizon[p]);
  const f = input.frequency;
  if (f === null) {
    notRun.push({ id: "fold-purge", reason: input.frequencyReason });
  } else {
    const purge = new FindingCollector();
    let pairs = 0;
    for (const [name, fold] of folds) {
      for (const test of fold.test) {
        for (const train of fold.train) {
          pairs++;
          if (touches(train, test, maxHorizon, input.embargo, f)) {
            purge.add(
              () => `fold ${name}: train ${train.start} to ${train.end} (line ${train.line}) touches test ${test.start} to ${test.end} (line ${test.line})`
            );
          }
        }
      }
    }
    findings.push({
      id: "fold-purge",
      count: purge.count,
      examples: purge.examples,
      summary: `${purge.count} of ${pairs} (training, test) segment pairs overlap the test window widened by ${maxHorizon} steps before (largest horizon) and ${input.embargo} after (embargo), at ${formatFrequency(f)}`
    });
  }
  const times = panel.timestamps.map((label) => toTimePoint(label, kind));
  const windows = /* @__PURE__ */ new Map();
  for (const [name, fold] of folds) windows.set(name, mergeWindows(fold.test));
  const anyFold = mergeWindows([...folds.values()].flatMap((fold) => fold.test));
  const outside = new FindingCollector();
  for (let p = 0; p < panel.size; p++) {
    const tests = panel.path === null ? anyFold : windows.get(panel.paths[panel.path[p]]);
    if (tests === void 0 || !insideAny(tests, times[panel.time[p]])) {
      outside.add(
        () => `${describePanelRow(panel, p)}${tests === void 0 ? " (no such fold in the layout)" : ""}`
      );
    }
  }
  findings.push({
    id: "outside-test-window",
    count: outside.count,
    examples: outside.examples,
    summary: `${outside.count} of ${panel.size} evaluated rows lie outside the test segments of their fold${panel.path === null ? " (no path column: any fold)" : ""}`
  });
  return { findings, notRun };
}
function touches(train, test, h, n, f) {
  const endsLate = compareTimePoints(train.to, test.from) >= 0 || stepsAhead(train.to, test.from, f) <= h;
  const startsEarly = compareTimePoints(train.from, test.to) <= 0 || stepsAhead(test.to, train.from, f) <= n;
  return endsLate && startsEarly;
}
function mergeWindows(segments) {
  const sorted = [...segments].sort((a, b) => compareTimePoints(a.from, b.from));
  const out = [];
  for (const s of sorted) {
    const last = out[out.length - 1];
    if (last !== void 0 && compareTimePoints(s.from, last.to) <= 0) {
      if (compareTimePoints(s.to, last.to) > 0) last.to = s.to;
    } else {
      out.push({ from: s.from, to: s.to });
    }
  }
  return out;
}
function insideAny(windows, t) {
  let lo2 = 0;
  let hi2 = windows.length - 1;
  let found = -1;
  while (lo2 <= hi2) {
    const mid = lo2 + hi2 >> 1;
    if (compareTimePoints(windows[mid].from, t) <= 0) {
      found = mid;
      lo2 = mid + 1;
    } else {
      hi2 = mid - 1;
    }
  }
  return found >= 0 && compareTimePoints(t, windows[found].to) <= 0;
}

// src/integrity/inferFrequency.ts
var BUSINESS_DAILY = { frequency: { unit: "businessDay", size: 1 } };
function isBusinessDaily(series) {
  let crossesWeekend = false;
  for (const points of series) {
    for (let i = 0; i < points.length; i++) {
      if (!isWeekday(points[i].wallDay)) return false;
      const from = points[i - 1]?.wallDay;
      if (from !== void 0 && points[i].wallDay - from === 3 && ((from - 1) % 7 + 7) % 7 === 0) {
        crossesWeekend = true;
      }
    }
  }
  return crossesWeekend;
}
var SLACK2 = 1e-6;
function inferFrequency(kind, series) {
  if (!series.some((points) => points.length >= 2)) {
    return { frequency: null, reason: "no series has two different timestamps" };
  }
  if (kind === "number") {
    return fromGaps(series, "number", (a, b) => b.seconds - a.seconds);
  }
  const first = series.find((points) => points.length > 0)[0];
  const every = (test) => series.every((points) => points.every(test));
  const oneTimeOfDay = every((p) => p.wallSecond === first.wallSecond);
  if (oneTimeOfDay) {
    const oneDay = every((p) => p.dayOfMonth === first.dayOfMonth);
    const monthEnds = every((p) => p.dayOfMonth === p.monthLength);
    if (oneDay || monthEnds) return fromGaps(series, "month", (a, b) => b.month - a.month);
    const daily = fromGaps(series, "day", (a, b) => b.wallDay - a.wallDay);
    return daily.frequency?.size === 1 && isBusinessDaily(series) ? BUSINESS_DAILY : daily;
  }
  return fromGaps(series, "second", (a, b) => b.seconds - a.seconds + (b.nanos - a.nanos) / 1e9);
}
function fromGaps(series, unit, gap) {
  let step = Number.POSITIVE_INFINITY;
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1], points[i]);
      if (g > 0 && g < step) step = g;
    }
  }
  if (!Number.isFinite(step)) {
    return { frequency: null, reason: "no two timestamps of a series are a step apart" };
  }
  const frequency = { unit, size: step };
  for (const points of series) {
    for (let i = 1; i < points.length; i++) {
      const g = gap(points[i - 1], points[i]);
      const ratio = g / step;
      if (Math.abs(ratio - Math.round(ratio)) > SLACK2 * Math.max(1, ratio)) {
        const other = { unit, size: g };
        return {
          frequency: null,
          reason: `irregular timestamps: gaps of ${formatFrequency(frequency)} and ${formatFrequency(other)} (not a multiple of it)`
        };
      }
    }
  }
  return { frequency };
}

// src/integrity/likeForLike.ts
function checkLikeForLike(input) {
  const { baseline: b, candidate: c } = input;
  const findings = [];
  const notRun = [];
  const labelSets = (id, what, pick, keyOf) => {
    const bc = pick(b);
    const cc = pick(c);
    if (bc === null || cc === null) {
      notRun.push({ id, reason: `the files have no ${what} column` });
      return;
    }
    findings.push(compareSets(id, what, keyed(bc.labels, keyOf), keyed(cc.labels, keyOf)));
  };
  labelSets("origin-sets", "origin", (t) => t.origin, timeKey(input.originKind));
  labelSets(
    "path-sets",
    "path",
    (t) => t.path,
    (label) => label
  );
  if (b.horizon === null || c.horizon === null) {
    notRun.push({ id: "horizon-sets", reason: "the files have no horizon column" });
  } else {
    findings.push(
      compareSets(
        "horizon-sets",
        "horizon",
        new Map([...distinct(b.horizon.values)].map((h) => [String(h), String(h)])),
        new Map([...distinct(c.horizon.values)].map((h) => [String(h), String(h)]))
      )
    );
  }
  if (input.timestampKind === "text") {
    notRun.push({ id: "time-spans", reason: "timestamps are in text order" });
  } else {
    findings.push(timeSpans(b, c, input.timestampKind));
  }
  labelSets(
    "series-coverage",
    "series",
    (t) => t.series,
    (label) => label
  );
  return { findings, notRun };
}
function timeKey(kind) {
  if (kind === "text") return (label) => label;
  return (label) => {
    const r = readLabel(label);
    return typeof r === "string" || r.kind === "text" ? label : String(r.key);
  };
}
function keyed(labels, keyOf) {
  const out = /* @__PURE__ */ new Map();
  for (const label of labels) {
    const key = keyOf(label);
    if (!out.has(key)) out.set(key, label);
  }
  return out;
}
function distinct(values) {
  const out = /* @__PURE__ */ new Set();
  for (let i = 0; i < values.length; i++) out.add(values[i]);
  return out;
}
function compareSets(id, what, baseline, candidate) {
  const onlyIn = (mine, other, role) => {
    const found = new FindingCollector();
    for (const [key, label] of mine) {
      if (!other.has(key)) found.add(() => `${what}=${label} only in the ${role}`);
    }
    return found;
  };
  const b = onlyIn(baseline, candidate, "baseline");
  const c = onlyIn(candidate, baseline, "candidate");
  const examples = [...b.examples.slice(0, c.count > 0 ? 3 : MAX_EXAMPLES), ...c.examples].slice(
    0,
    MAX_EXAMPLES
  );
  return {
    id,
    count: b.count + c.count,
    examples,
    summary: `${b.count} of ${baseline.size} ${what} values only in the baseline, ${c.count} of ${candidate.size} only in the candidate`
  };
}
function timeSpans(b, c, kind) {
  const keyOf = timeKey(kind);
  const order = (x, y) => kind === "number" ? Number(x) - Number(y) : x < y ? -1 : x > y ? 1 : 0;
  const span = (t) => {
    const keys = keyed(t.timestamp.labels, keyOf);
    const sorted = [...keys.keys()].sort(order);
    return { keys, first: sorted[0], last: sorted[sorted.length - 1] };
  };
  const sb = span(b);
  const sc = span(c);
  const found = new FindingCollector();
  const outside = (mine, other, role, otherRole) => {
    let n = 0;
    for (const [key, label2] of mine.keys) {
      if (order(key, other.first) < 0 || order(key, other.last) > 0) {
        n++;
        found.add(() => `timestamp=${label2} in the ${role}, outside the ${otherRole}'s span`);
      }
    }
    return n;
  };
  const nb = outside(sb, sc, "baseline", "candidate");
  const nc = outside(sc, sb, "candidate", "baseline");
  const label = (s) => `${s.keys.get(s.first)} to ${s.keys.get(s.last)}`;
  return {
    id: "time-spans",
    count: found.count,
    examples: found.examples,
    summary: `baseline spans ${label(sb)}, candidate ${label(sc)}: ${nb} baseline and ${nc} candidate timestamps lie outside the other's span`
  };
}

// src/integrity/rowKey.ts
function describeTableRow(table, i) {
  const parts = [];
  if (table.series !== null) parts.push(`series=${table.series.labels[table.series.ids[i]]}`);
  parts.push(`timestamp=${table.timestamp.labels[table.timestamp.ids[i]]}`);
  if (table.horizon !== null) parts.push(`horizon=${table.horizon.values[i]}`);
  if (table.origin !== null) parts.push(`origin=${table.origin.labels[table.origin.ids[i]]}`);
  if (table.path !== null) parts.push(`path=${table.path.labels[table.path.ids[i]]}`);
  return `${table.summary.role} line ${table.lines[i]}: ${parts.join(" ")}`;
}

// src/integrity/rowChecks.ts
function checkRows(input) {
  const { tables } = input;
  if (tables.some((t) => t.origin === null)) {
    const reason = "the predictions files have no origin column";
    return {
      findings: [],
      notRun: [
        { id: "look-ahead", reason },
        { id: "horizon-steps", reason },
        { id: "origin-after-actuals", reason }
      ]
    };
  }
  if (input.timestampKind === "text" || input.originKind !== input.timestampKind) {
    const reason = input.timestampKind === "text" ? "timestamps are in text order (neither all numbers nor all ISO 8601)" : `origins are ${input.originKind === "number" ? "numbers" : input.originKind} but timestamps are ${input.timestampKind === "number" ? "numbers" : input.timestampKind}, so they cannot be compared`;
    return {
      findings: [],
      notRun: [
        { id: "look-ahead", reason },
        { id: "horizon-steps", reason },
        { id: "origin-after-actuals", reason }
      ]
    };
  }
  const kind = input.timestampKind;
  const lookAhead = new FindingCollector();
  const horizon = new FindingCollector();
  const afterActuals = new FindingCollector();
  const notRun = [];
  const f = input.frequency;
  const hasHorizon = tables.every((t) => t.horizon !== null);
  if (!hasHorizon) notRun.push({ id: "horizon-steps", reason: "the files have no horizon column" });
  else if (f === null) notRun.push({ id: "horizon-steps", reason: input.frequencyReason });
  const countSteps = hasHorizon && f !== null;
  let rows = 0;
  for (const table of tables) {
    const times = timePointsOf(table.timestamp.labels, kind);
    const origins = timePointsOf(table.origin.labels, kind);
    const tIds = table.timestamp.ids;
    const oIds = table.origin.ids;
    const h = table.horizon?.values;
    rows += table.size;
    for (let i = 0; i < table.size; i++) {
      const t = times[tIds[i]];
      const o = origins[oIds[i]];
      if (compareTimePoints(o, t) >= 0) lookAhead.add(() => describeTableRow(table, i));
      else if (countSteps && stepsAhead(o, t, f) !== h[i]) {
        horizon.add(() => {
          const steps = stepsAhead(o, t, f);
          return `${describeTableRow(table, i)} (${steps} step${steps === 1 ? "" : "s"} of ${formatFrequency(f)})`;
        });
      }
      if (input.lastActual !== null && compareTimePoints(o, input.lastActual) > 0) {
        afterActuals.add(() => describeTableRow(table, i));
      }
    }
  }
  const findings = [
    {
      id: "look-ahead",
      ...lookAhead,
      summary: `${lookAhead.count} of ${rows} predictions rows have an origin at or after the timestamp they forecast`
    }
  ];
  if (countSteps) {
    findings.push({
      id: "horizon-steps",
      ...horizon,
      summary: `${horizon.count} of ${rows} rows have a horizon that differs from the steps of ${formatFrequency(f)} from origin to timestamp`
    });
  }
  if (input.lastActual === null) {
    notRun.push({ id: "origin-after-actuals", reason: "no actual has a comparable timestamp" });
  } else {
    findings.push({
      id: "origin-after-actuals",
      ...afterActuals,
      summary: `${afterActuals.count} of ${rows} rows were issued after the last actual (${input.lastActualLabel})`
    });
  }
  return { findings, notRun };
}

// src/integrity/checkBacktest.ts
function checkBacktest(input, settings) {
  const timestampKind = readableKind(input.panel.timestampKind, [
    input.panel.timestamps,
    input.baseline.timestamp.labels,
    input.candidate.timestamp.labels,
    ...input.actuals === void 0 ? [] : [input.actuals.timestamp.labels]
  ]);
  const originKind = readableKind(input.panel.originKind, [
    input.baseline.origin?.labels ?? [],
    input.candidate.origin?.labels ?? []
  ]);
  const panel = { ...input.panel, timestampKind, originKind };
  const frequency = chooseFrequency(panel, settings.frequency);
  const findings = [];
  const notRun = [];
  const add = (part) => {
    findings.push(...part.findings);
    notRun.push(...part.notRun);
  };
  const actualTables = input.actuals === void 0 ? [input.baseline, input.candidate] : [input.actuals];
  const last = lastTime(actualTables, panel.timestampKind);
  add(
    checkRows({
      tables: [input.baseline, input.candidate],
      timestampKind: panel.timestampKind,
      originKind: panel.originKind,
      lastActual: last?.point ?? null,
      lastActualLabel: last?.label ?? "",
      frequency: frequency.frequency,
      frequencyReason: frequency.reason
    })
  );
  add(
    checkLikeForLike({
      baseline: input.baseline,
      candidate: input.candidate,
      timestampKind: panel.timestampKind,
      originKind: panel.originKind
    })
  );
  if (input.folds === void 0) {
    const reason = "no fold layout given (--folds FILE)";
    notRun.push({ id: "fold-purge", reason }, { id: "outside-test-window", reason });
  } else {
    add(
      checkFolds({
        panel,
        layout: input.folds,
        embargo: settings.embargo,
        frequency: frequency.frequency,
        frequencyReason: frequency.reason
      })
    );
  }
  add(checkExactPredictions(panel));
  const rank = (id) => CHECK_IDS.indexOf(id);
  findings.sort((a, b) => rank(a.id) - rank(b.id));
  notRun.sort((a, b) => rank(a.id) - rank(b.id));
  return applyCheckPolicy(
    findings,
    notRun,
    settings.mode,
    frequency.frequency === null ? null : { text: formatFrequency(frequency.frequency), source: frequency.source }
  );
}
function chooseFrequency(panel, text) {
  const kind = panel.timestampKind;
  if (text !== "auto") {
    const f = parseFrequency(text);
    if (f === null) throw new InputError("frequency is not a frequency", { value: text });
    if (kind === "text") {
      return { frequency: null, reason: "timestamps are in text order", source: "given" };
    }
    if (f.unit === "number" !== (kind === "number")) {
      throw new InputError(
        kind === "number" ? `the frequency ${text} has a unit, but the timestamps are numbers: give a plain step such as 1` : `the frequency ${text} is a plain number, but the timestamps are ISO 8601 date-times: give a unit such as 1h, 1d or 1mo`,
        { value: text }
      );
    }
    return { frequency: f, reason: "", source: "given" };
  }
  if (kind === "text") {
    return {
      frequency: null,
      reason: "timestamps are in text order, so steps cannot be counted",
      source: "inferred"
    };
  }
  const inferred = inferFrequency(kind, pointsBySeries(panel, kind));
  return inferred.frequency === null ? {
    frequency: null,
    reason: `no frequency: ${inferred.reason}; give --frequency`,
    source: "inferred"
  } : { frequency: inferred.frequency, reason: "", source: "inferred" };
}
function pointsBySeries(panel, kind) {
  const points = panel.timestamps.map((label) => toTimePoint(label, kind));
  const out = panel.seriesNames.map(() => []);
  let lastSeries = -1;
  let lastTime2 = -1;
  for (let p = 0; p < panel.size; p++) {
    const series = panel.series[p];
    const time = panel.time[p];
    if (series === lastSeries && time === lastTime2) continue;
    if (series === lastSeries && time < lastTime2) {
      throw new Error("the aligned panel is not sorted by series and timestamp");
    }
    out[series].push(points[time]);
    lastSeries = series;
    lastTime2 = time;
  }
  return out;
}
function readableKind(kind, lists) {
  if (kind === "text") return kind;
  for (const labels of lists) {
    for (const label of labels) if (toTimePoint(label, kind) === null) return "text";
  }
  return kind;
}
function lastTime(tables, kind) {
  if (kind === "text") return null;
  let best = null;
  for (const table of tables) {
    for (const label of table.timestamp.labels) {
      const point = toTimePoint(label, kind);
      if (point !== null && (best === null || compareTimePoints(point, best.point) > 0)) {
        best = { point, label };
      }
    }
  }
  return best;
}

// src/reading/tokenizer.ts
var Tokenizer = class {
  /** Empty lines skipped so far. */
  blankLines = 0;
  delimiter;
  delimiterCode;
  sink;
  file;
  fields = [];
  carry = "";
  linesDone = 0;
  started = false;
  constructor(delimiter, sink, file) {
    this.delimiter = delimiter;
    this.delimiterCode = delimiter.charCodeAt(0);
    this.sink = sink;
    this.file = file;
  }
  /** Physical lines consumed so far (complete records and blank lines). */
  get lines() {
    return this.linesDone;
  }
  push(chunk) {
    let buf = this.carry.length > 0 ? this.carry + chunk : chunk;
    this.carry = "";
    if (!this.started) {
      if (buf.length === 0) return;
      this.started = true;
      if (buf.charCodeAt(0) === 65279) buf = buf.slice(1);
    }
    const n = buf.length;
    const delimiter = this.delimiter;
    const fields = this.fields;
    const sink = this.sink;
    let pos = 0;
    let nextQuote = buf.indexOf('"');
    let nextDelim = -2;
    while (pos < n) {
      const nl = buf.indexOf("\n", pos);
      if (nextQuote !== -1 && nextQuote < pos) nextQuote = buf.indexOf('"', pos);
      if (nextQuote !== -1 && (nl === -1 || nextQuote < nl)) {
        const end = this.slowRecord(buf, pos);
        if (end < 0) break;
        pos = end;
        continue;
      }
      if (nl === -1) break;
      let lineEnd = nl;
      if (lineEnd > pos && buf.charCodeAt(lineEnd - 1) === 13) lineEnd--;
      this.linesDone++;
      if (lineEnd === pos) {
        this.blankLines++;
        pos = nl + 1;
        continue;
      }
      let count = 0;
      let start = pos;
      for (; ; ) {
        if (nextDelim !== -1 && nextDelim < start) nextDelim = buf.indexOf(delimiter, start);
        if (nextDelim === -1 || nextDelim >= lineEnd) {
          fields[count++] = buf.slice(start, lineEnd);
          break;
        }
        fields[count++] = buf.slice(start, nextDelim);
        start = nextDelim + 1;
      }
      sink(fields, count, this.linesDone);
      pos = nl + 1;
    }
    if (pos < n) this.carry = buf.slice(pos);
  }
  /** Flushes the last record (which need not end with a line break). */
  end() {
    if (this.carry.length === 0) return;
    const startLine = this.linesDone + 1;
    this.push("\n");
    if (this.carry.length > 0) {
      throw new InputError("a quoted field is not closed before the end of the file", {
        file: this.file,
        line: startLine,
        value: truncateValue(this.carry)
      });
    }
  }
  /**
   * Parses one record that contains a quote, char by char. Returns the position after its line
   * break, or −1 when the buffer ends first (the caller keeps the tail for the next chunk).
   */
  slowRecord(buf, pos) {
    const n = buf.length;
    const d = this.delimiterCode;
    const fields = this.fields;
    let count = 0;
    let i = pos;
    let newlines = 0;
    for (; ; ) {
      if (i < n && buf.charCodeAt(i) === 34) {
        i++;
        const fieldStart = i;
        let value = "";
        let segment = i;
        for (; ; ) {
          const q = buf.indexOf('"', i);
          if (q === -1 || q + 1 >= n) return -1;
          if (buf.charCodeAt(q + 1) === 34) {
            value += buf.slice(segment, q + 1);
            i = q + 2;
            segment = i;
            continue;
          }
          value += buf.slice(segment, q);
          newlines += countNewlines(buf, fieldStart, q);
          i = q + 1;
          break;
        }
        fields[count++] = value;
        const c = buf.charCodeAt(i);
        if (c === d) {
          i++;
          continue;
        }
        if (c === 10) {
          i++;
          break;
        }
        if (c === 13) {
          if (i + 1 >= n) return -1;
          if (buf.charCodeAt(i + 1) === 10) {
            i += 2;
            break;
          }
        }
        throw new InputError(
          "unexpected character after a closing quote (a quoted field must be followed by a delimiter or the end of the line)",
          {
            file: this.file,
            line: this.linesDone + 1 + newlines,
            value: truncateValue(buf.slice(pos, Math.min(n, i + 20)))
          }
        );
      }
      let j = i;
      while (j < n) {
        const c = buf.charCodeAt(j);
        if (c === d || c === 10) break;
        j++;
      }
      if (j >= n) return -1;
      if (buf.charCodeAt(j) === d) {
        fields[count++] = buf.slice(i, j);
        i = j + 1;
        continue;
      }
      const end = j > i && buf.charCodeAt(j - 1) === 13 ? j - 1 : j;
      fields[count++] = buf.slice(i, end);
      i = j + 1;
      break;
    }
    const line = this.linesDone + 1;
    this.linesDone += 1 + newlines;
    this.sink(fields, count, line);
    return i;
  }
};
function countNewlines(text, from, to) {
  let count = 0;
  let i = text.indexOf("\n", from);
  while (i !== -1 && i < to) {
    count++;
    i = text.indexOf("\n", i + 1);
  }
  return count;
}
function truncateValue(text) {
  return text.length <= 60 ? text : `${text.slice(0, 60)}\u2026`;
}

// src/reading/foldLayoutReader.ts
var FOLD_NAMES = ["fold", "path"];
var REQUIRED = ["role", "start", "end"];
var MAX_SEGMENTS = 1e4;
var FoldLayoutReader = class {
  tokenizer;
  file;
  index = null;
  segments = [];
  constructor(file, format) {
    this.file = file;
    this.tokenizer = new Tokenizer(
      format === "tsv" ? "	" : ",",
      (fields, count, line) => this.record(fields.slice(0, count), line),
      file
    );
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  get linesRead() {
    return this.tokenizer.lines;
  }
  finish() {
    this.tokenizer.end();
    if (this.index === null) {
      throw new InputError("the fold layout is empty (expected a header: fold,role,start,end)", {
        file: this.file
      });
    }
    if (this.segments.length === 0) {
      throw new InputError("the fold layout has a header but no segments", {
        file: this.file,
        line: 2
      });
    }
    return { file: this.file, segments: this.segments };
  }
  record(fields, line) {
    if (this.index === null) {
      const index = /* @__PURE__ */ new Map();
      fields.forEach((name, i) => {
        const key = name.trim().toLowerCase();
        if (!index.has(key)) index.set(key, i);
      });
      const fold = FOLD_NAMES.find((n) => index.has(n));
      for (const name of [...REQUIRED, fold ?? "fold"]) {
        if (!index.has(name)) {
          throw new InputError(
            `the fold layout needs the columns fold (or path), role, start and end; "${name}" is missing`,
            { file: this.file, line, value: fields.join(",") }
          );
        }
      }
      index.set("fold", index.get(fold));
      this.index = index;
      return;
    }
    if (this.segments.length >= MAX_SEGMENTS) {
      throw new InputError(`the fold layout has more than ${MAX_SEGMENTS} segments`, {
        file: this.file,
        line
      });
    }
    const at = (name) => (fields[this.index.get(name)] ?? "").trim();
    const role = at("role");
    if (role !== "train" && role !== "test") {
      throw new InputError("role must be train or test", {
        file: this.file,
        line,
        column: "role",
        value: role
      });
    }
    for (const name of ["fold", "start", "end"]) {
      if (at(name) === "") {
        throw new InputError(`empty ${name}`, { file: this.file, line, column: name, value: "" });
      }
    }
    this.segments.push({ fold: at("fold"), role, start: at("start"), end: at("end"), line });
  }
};

// src/reading/streamTextFile.ts
import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import { pipeline } from "node:stream/promises";
import { TextDecoder } from "node:util";
import { createGunzip } from "node:zlib";
var CHUNK_BYTES = 1 << 20;
async function streamTextFile(path, gzip, sink, onProgress) {
  let totalBytes;
  try {
    const info = await stat(path);
    if (!info.isFile()) throw new InputError("not a regular file", { file: path });
    totalBytes = info.size;
  } catch (error) {
    throw asInputError(error, path);
  }
  const hash = createHash("sha256");
  const decoder = new TextDecoder("utf-8", { fatal: true });
  let bytesRead = 0;
  const tap = async function* (source) {
    for await (const chunk of source) {
      hash.update(chunk);
      bytesRead += chunk.length;
      onProgress?.(bytesRead, totalBytes);
      yield chunk;
    }
  };
  const consume = async (source) => {
    for await (const chunk of source) sink.push(decode(decoder, chunk, true, path, sink));
    sink.push(decode(decoder, void 0, false, path, sink));
  };
  try {
    const raw = createReadStream(path, { highWaterMark: CHUNK_BYTES });
    if (gzip) await pipeline(raw, tap, createGunzip({ chunkSize: CHUNK_BYTES }), consume);
    else await pipeline(raw, tap, consume);
  } catch (error) {
    throw asInputError(error, path);
  }
  return `sha256:${hash.digest("hex")}`;
}
function decode(decoder, chunk, stream, path, sink) {
  try {
    return decoder.decode(chunk, { stream });
  } catch {
    throw new InputError(
      `the file is not valid UTF-8 text (the first invalid bytes come after line ${sink.linesRead})`,
      { file: path }
    );
  }
}
function asInputError(error, path) {
  if (error instanceof InputError) return error;
  const code = error?.code;
  if (code === "ENOENT") return new InputError("no such file", { file: path });
  if (code === "EACCES" || code === "EPERM")
    return new InputError("permission denied", { file: path });
  if (code === "EISDIR") return new InputError("is a directory, not a file", { file: path });
  if (typeof code === "string" && code.startsWith("Z_")) {
    return new InputError(`not a valid gzip file (${error.message})`, { file: path });
  }
  const message = error instanceof Error ? error.message : String(error);
  return new InputError(`cannot read the file: ${message}`, { file: path });
}

// src/reading/columnMapping.ts
var COLUMN_ROLES = [
  "series",
  "timestamp",
  "horizon",
  "origin",
  "path",
  "actual",
  "prediction",
  "weight",
  "quantile"
];
var DEFAULT_COLUMNS = {
  series: "series",
  timestamp: "timestamp",
  horizon: "horizon",
  origin: "origin",
  path: "path",
  actual: "actual",
  prediction: "prediction",
  weight: "weight",
  quantile: "q"
};
function resolveColumns(mapping = {}) {
  const resolved = { ...DEFAULT_COLUMNS };
  for (const role of COLUMN_ROLES) {
    const name = mapping[role];
    if (name !== void 0) resolved[role] = name;
  }
  return resolved;
}
function parseColumnMapping(text, source = "--columns") {
  const mapping = {};
  if (text.trim() === "") return mapping;
  for (const rawPair of text.split(",")) {
    const pair = rawPair.trim();
    const eq = pair.indexOf("=");
    if (eq < 0) {
      throw new InputError(
        `expected role=column pairs separated by commas, e.g. "actual=observed,prediction=point"`,
        { file: source, value: pair }
      );
    }
    const role = pair.slice(0, eq).trim();
    const name = pair.slice(eq + 1).trim();
    if (!isRole(role)) {
      throw new InputError(`unknown column role "${role}"; roles are ${COLUMN_ROLES.join(", ")}`, {
        file: source,
        value: pair
      });
    }
    if (name === "") {
      throw new InputError(`the column name for role "${role}" is empty`, {
        file: source,
        value: pair
      });
    }
    if (mapping[role] !== void 0) {
      throw new InputError(`role "${role}" is mapped twice`, { file: source, value: pair });
    }
    mapping[role] = name;
  }
  checkDistinctNames(mapping, source);
  return mapping;
}
function checkDistinctNames(mapping, source = "--columns") {
  const resolved = resolveColumns(mapping);
  const seen = /* @__PURE__ */ new Map();
  for (const role of COLUMN_ROLES) {
    if (role === "quantile") continue;
    const name = resolved[role];
    const other = seen.get(name);
    if (other !== void 0) {
      throw new InputError(`roles "${other}" and "${role}" both use the column "${name}"`, {
        file: source,
        value: name
      });
    }
    seen.set(name, role);
  }
}
function isRole(text) {
  return COLUMN_ROLES.includes(text);
}

// src/reading/tableBuilder.ts
var ForecastTableReader = class {
  tokenizer;
  path;
  options;
  header = null;
  headerLine = 0;
  rows = 0;
  capacity = 0;
  lines = new Int32Array(0);
  seriesIds = new Int32Array(0);
  timeIds = new Int32Array(0);
  originIds = new Int32Array(0);
  pathIds = new Int32Array(0);
  horizons = new Int32Array(0);
  actual = new Float64Array(0);
  prediction = new Float64Array(0);
  weight = new Float64Array(0);
  quantileValues = [];
  seriesLabels = new Interner();
  timeLabels = new Interner();
  originLabels = new Interner();
  pathLabels = new Interner();
  constructor(path, options) {
    this.path = path;
    this.options = options;
    checkDistinctNames(options.columns ?? {});
    const delimiter = options.format === "tsv" ? "	" : ",";
    this.tokenizer = new Tokenizer(
      delimiter,
      (fields, count, line) => {
        if (this.header === null) this.readHeader(fields, count, line);
        else this.readRow(fields, count, line);
      },
      path
    );
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  /** Physical lines fully read so far. */
  get linesRead() {
    return this.tokenizer.lines;
  }
  /** Ends the input and returns the table; `sha256` is recorded in the summary as given. */
  finish(sha256 = "") {
    this.tokenizer.end();
    const header = this.header;
    if (header === null) {
      throw new InputError("the file is empty (expected a header line and data rows)", {
        file: this.path,
        line: 1
      });
    }
    if (this.rows === 0) {
      throw new InputError("the file has a header but no data rows", {
        file: this.path,
        line: this.headerLine + 1
      });
    }
    const n = this.rows;
    const summary = {
      role: this.options.role,
      path: this.path,
      rows: n,
      sha256,
      columns: header.names,
      ignoredColumns: header.ignored,
      blankLines: this.tokenizer.blankLines
    };
    const label = (interner, ids, column) => ({
      column,
      ids: ids.slice(0, n),
      labels: interner.labels,
      firstLines: Int32Array.from(interner.firstLines)
    });
    const quantiles = header.quantiles.map((q, k) => ({
      level: q.level,
      column: q.column,
      values: this.quantileValues[k].slice(0, n)
    }));
    return {
      summary,
      size: n,
      lines: this.lines.slice(0, n),
      series: header.series < 0 ? null : label(this.seriesLabels, this.seriesIds, header.names[header.series]),
      timestamp: label(this.timeLabels, this.timeIds, header.names[header.timestamp]),
      horizon: header.horizon < 0 ? null : { column: header.names[header.horizon], values: this.horizons.slice(0, n) },
      origin: header.origin < 0 ? null : label(this.originLabels, this.originIds, header.names[header.origin]),
      path: header.path < 0 ? null : label(this.pathLabels, this.pathIds, header.names[header.path]),
      actual: header.actual < 0 ? null : { column: header.names[header.actual], values: this.actual.slice(0, n) },
      prediction: header.prediction < 0 ? null : { column: header.names[header.prediction], values: this.prediction.slice(0, n) },
      weight: header.weight < 0 ? null : { column: header.names[header.weight], values: this.weight.slice(0, n) },
      quantiles
    };
  }
  readHeader(fields, count, line) {
    this.header = resolveHeader(fields.slice(0, count), this.path, line, this.options);
    this.headerLine = line;
    this.quantileValues = this.header.quantiles.map(() => new Float64Array(0));
  }
  grow() {
    const capacity = Math.max(1024, this.capacity * 2);
    const h = this.header;
    this.lines = growInt(this.lines, capacity);
    this.timeIds = growInt(this.timeIds, capacity);
    if (h.series >= 0) this.seriesIds = growInt(this.seriesIds, capacity);
    if (h.origin >= 0) this.originIds = growInt(this.originIds, capacity);
    if (h.path >= 0) this.pathIds = growInt(this.pathIds, capacity);
    if (h.horizon >= 0) this.horizons = growInt(this.horizons, capacity);
    if (h.actual >= 0) this.actual = growFloat(this.actual, capacity);
    if (h.prediction >= 0) this.prediction = growFloat(this.prediction, capacity);
    if (h.weight >= 0) this.weight = growFloat(this.weight, capacity);
    this.quantileValues = this.quantileValues.map((v) => growFloat(v, capacity));
    this.capacity = capacity;
  }
  readRow(fields, count, line) {
    const h = this.header;
    if (count !== h.names.length) {
      throw new InputError(`expected ${h.names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line,
        value: fields.slice(0, count).join(this.options.format === "tsv" ? "	" : ",")
      });
    }
    const r = this.rows;
    if (r === this.capacity) this.grow();
    this.lines[r] = line;
    if (h.series >= 0) {
      this.seriesIds[r] = this.keyLabel(this.seriesLabels, fields[h.series], h.series, line);
    }
    this.timeIds[r] = this.keyLabel(this.timeLabels, fields[h.timestamp], h.timestamp, line);
    if (h.origin >= 0) {
      this.originIds[r] = this.keyLabel(this.originLabels, fields[h.origin], h.origin, line);
    }
    if (h.path >= 0) {
      this.pathIds[r] = this.keyLabel(this.pathLabels, fields[h.path], h.path, line);
    }
    if (h.horizon >= 0) {
      const text = fields[h.horizon];
      const value = parseHorizon(text);
      if (value === 0) {
        throw new InputError("the horizon must be a whole number \u2265 1", {
          file: this.path,
          line,
          column: h.names[h.horizon],
          value: text
        });
      }
      this.horizons[r] = value;
    }
    if (h.actual >= 0) this.actual[r] = this.number(fields[h.actual], h.actual, line);
    if (h.prediction >= 0) {
      this.prediction[r] = this.number(fields[h.prediction], h.prediction, line);
    }
    if (h.weight >= 0) {
      const value = this.number(fields[h.weight], h.weight, line);
      if (value < 0) {
        throw new InputError("weights must be \u2265 0", {
          file: this.path,
          line,
          column: h.names[h.weight],
          value: fields[h.weight]
        });
      }
      this.weight[r] = value;
    }
    const qs = h.quantiles;
    for (let k = 0; k < qs.length; k++) {
      const index = qs[k].index;
      this.quantileValues[k][r] = this.number(fields[index], index, line);
    }
    this.rows = r + 1;
  }
  keyLabel(interner, text, index, line) {
    if (text.length === 0) {
      throw new InputError("empty value in a key column", {
        file: this.path,
        line,
        column: this.header.names[index],
        value: text
      });
    }
    return interner.id(text, line);
  }
  number(text, index, line) {
    const value = parseDecimal(text);
    if (!Number.isNaN(value)) return value;
    throw new InputError(
      text.length === 0 ? "empty value where a number is required" : "not a finite decimal number",
      { file: this.path, line, column: this.header.names[index], value: text }
    );
  }
};
function resolveHeader(names, file, line, options) {
  const columns = resolveColumns(options.columns);
  const predictions = options.role !== "actuals";
  const used = /* @__PURE__ */ new Set();
  const find = (name, wanted) => {
    if (!wanted) return -1;
    const first = names.indexOf(name);
    if (first < 0) return -1;
    const second = names.indexOf(name, first + 1);
    if (second >= 0) {
      throw new InputError(
        `the column "${name}" appears twice in the header (fields ${first + 1} and ${second + 1})`,
        { file, line, column: name, value: name }
      );
    }
    used.add(first);
    return first;
  };
  const series = find(columns.series, true);
  const timestamp = find(columns.timestamp, true);
  const horizon = find(columns.horizon, predictions);
  const origin = find(columns.origin, predictions);
  const path = find(columns.path, predictions);
  const actual = find(columns.actual, true);
  const prediction = find(columns.prediction, predictions);
  const weight = find(columns.weight, true);
  const quantiles = [];
  if (predictions) {
    const prefix = columns.quantile;
    names.forEach((name, index) => {
      if (used.has(index) || !name.startsWith(prefix)) return;
      const levelText = name.slice(prefix.length);
      const level = parseDecimal(levelText);
      if (Number.isNaN(level)) return;
      if (!(level > 0 && level < 1)) {
        throw new InputError(
          `quantile level ${levelText} is not strictly between 0 and 1 (write e.g. ${prefix}0.1 for the 10% quantile)`,
          { file, line, column: name, value: name }
        );
      }
      const same = quantiles.find((q) => q.level === level);
      if (same !== void 0) {
        throw new InputError(
          `quantile level ${level} appears twice in the header (columns "${same.column}" and "${name}")`,
          { file, line, column: name, value: name }
        );
      }
      quantiles.push({ level, column: name, index });
      used.add(index);
    });
    quantiles.sort((a, b) => a.level - b.level);
  }
  const header = names.map((n) => JSON.stringify(n)).join(", ");
  const missing = (role, name, why) => new InputError(
    `missing the ${role} column "${name}" ${why}; the header has ${header} (map another column with e.g. ${role}=NAME)`,
    { file, line, column: name }
  );
  if (timestamp < 0) throw missing("timestamp", columns.timestamp, "(required)");
  if (actual < 0 && (!predictions || options.requireActual === true)) {
    throw missing(
      "actual",
      columns.actual,
      predictions ? "(required when there is no separate actuals file)" : "(required in an actuals file)"
    );
  }
  if (predictions && prediction < 0 && quantiles.length === 0) {
    throw missing(
      "prediction",
      columns.prediction,
      `(required unless quantile columns such as ${columns.quantile}0.5 are present)`
    );
  }
  const ignored = names.filter((_, index) => !used.has(index));
  return {
    names,
    ignored,
    series,
    timestamp,
    horizon,
    origin,
    path,
    actual,
    prediction,
    weight,
    quantiles
  };
}
var Interner = class {
  labels = [];
  firstLines = [];
  map = /* @__PURE__ */ new Map();
  last = "";
  lastId = -1;
  id(text, line) {
    if (this.lastId >= 0 && text === this.last) return this.lastId;
    let id = this.map.get(text);
    if (id === void 0) {
      const own = ` ${text}`.slice(1);
      id = this.labels.length;
      this.labels.push(own);
      this.firstLines.push(line);
      this.map.set(own, id);
    }
    this.last = text;
    this.lastId = id;
    return id;
  }
};
function growInt(array, capacity) {
  const next = new Int32Array(capacity);
  next.set(array);
  return next;
}
function growFloat(array, capacity) {
  const next = new Float64Array(capacity);
  next.set(array);
  return next;
}

// src/reading/readForecastFile.ts
function formatFromPath(path) {
  const lower = path.toLowerCase();
  const gzip = lower.endsWith(".gz");
  const base = gzip ? lower.slice(0, -3) : lower;
  return { format: base.endsWith(".tsv") ? "tsv" : "csv", gzip };
}
async function readForecastFile(path, options) {
  const implied = formatFromPath(path);
  const format = options.format ?? implied.format;
  const reader = new ForecastTableReader(path, {
    role: options.role,
    format,
    ...options.columns === void 0 ? {} : { columns: options.columns },
    ...options.requireActual === void 0 ? {} : { requireActual: options.requireActual }
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}

// src/reading/readFoldLayout.ts
async function readFoldLayout(path, format) {
  const implied = formatFromPath(path);
  const reader = new FoldLayoutReader(path, format ?? implied.format);
  await streamTextFile(path, implied.gzip, reader);
  return reader.finish();
}

// src/reading/lossSeriesReader.ts
var REQUIRED2 = ["baseline_loss", "candidate_loss"];
var KNOWN = ["baseline_loss", "candidate_loss", "differential", "rows", "horizon"];
var LossSeriesReader = class {
  path;
  timestampName;
  tokenizer;
  header = null;
  lines = [];
  labels = [];
  ids = [];
  firstLines = [];
  idOf = /* @__PURE__ */ new Map();
  baseline = [];
  candidate = [];
  rows = [];
  horizon = [];
  constructor(path, options) {
    this.path = path;
    this.timestampName = options.timestampColumn ?? "timestamp";
    this.tokenizer = new Tokenizer(
      options.format === "tsv" ? "	" : ",",
      (fields, count, line) => this.record(fields, count, line),
      path
    );
  }
  get linesRead() {
    return this.tokenizer.lines;
  }
  push(chunk) {
    this.tokenizer.push(chunk);
  }
  finish(sha256 = "") {
    this.tokenizer.end();
    if (this.header === null) throw new InputError("the file is empty", { file: this.path });
    if (this.baseline.length === 0) {
      throw new InputError("the file has a header but no data rows", { file: this.path });
    }
    const names = this.header.names;
    return {
      summary: {
        role: "losses",
        path: this.path,
        rows: this.baseline.length,
        sha256,
        columns: names,
        ignoredColumns: names.filter((n) => n !== this.timestampName && !KNOWN.includes(n)),
        blankLines: this.tokenizer.blankLines
      },
      size: this.baseline.length,
      lines: Int32Array.from(this.lines),
      timestamp: {
        column: this.timestampName,
        ids: Int32Array.from(this.ids),
        labels: this.labels,
        firstLines: Int32Array.from(this.firstLines)
      },
      baseline: Float64Array.from(this.baseline),
      candidate: Float64Array.from(this.candidate),
      rows: Int32Array.from(this.rows),
      horizon: Int32Array.from(this.horizon)
    };
  }
  record(fields, count, line) {
    if (this.header === null) {
      const names2 = fields.slice(0, count).map((f) => f.trim());
      const index2 = {};
      names2.forEach((n, i) => {
        if (n in index2) {
          throw new InputError(`the header names the column "${n}" twice`, {
            file: this.path,
            line
          });
        }
        index2[n] = i;
      });
      for (const need of [this.timestampName, ...REQUIRED2]) {
        if (!(need in index2)) {
          throw new InputError(
            `a loss file needs the columns ${this.timestampName}, baseline_loss and candidate_loss; "${need}" is missing`,
            { file: this.path, line, column: need }
          );
        }
      }
      this.header = { names: names2, index: index2 };
      return;
    }
    const { names, index } = this.header;
    if (count !== names.length) {
      throw new InputError(`expected ${names.length} fields as in the header, found ${count}`, {
        file: this.path,
        line
      });
    }
    const at = (name) => fields[index[name]];
    const number = (name) => {
      const text = at(name);
      const x = parseDecimal(text);
      if (Number.isNaN(x)) {
        throw new InputError("not a finite decimal number", {
          file: this.path,
          line,
          column: name,
          value: text
        });
      }
      return x;
    };
    const integer = (name) => {
      if (!(name in index)) return 1;
      const x = number(name);
      if (!Number.isInteger(x) || x < 1) {
        throw new InputError("expected a whole number \u2265 1", {
          file: this.path,
          line,
          column: name,
          value: at(name)
        });
      }
      return x;
    };
    const label = at(this.timestampName);
    if (label === "") {
      throw new InputError("empty timestamp", {
        file: this.path,
        line,
        column: this.timestampName
      });
    }
    const b = number("baseline_loss");
    const c = number("candidate_loss");
    if ("differential" in index) {
      const d = number("differential");
      const scale = Math.max(1, Math.abs(b), Math.abs(c));
      if (Math.abs(d - (c - b)) > 1e-9 * scale) {
        throw new InputError(`differential should be candidate_loss \u2212 baseline_loss = ${c - b}`, {
          file: this.path,
          line,
          column: "differential",
          value: at("differential")
        });
      }
    }
    let id = this.idOf.get(label);
    if (id === void 0) {
      id = this.labels.length;
      this.idOf.set(label, id);
      this.labels.push(label);
      this.firstLines.push(line);
    } else {
      throw new InputError(
        `timestamp ${JSON.stringify(label)} appears twice (first on line ${this.firstLines[id]})`,
        {
          file: this.path,
          line,
          column: this.timestampName,
          value: label
        }
      );
    }
    this.ids.push(id);
    this.lines.push(line);
    this.baseline.push(b);
    this.candidate.push(c);
    this.rows.push(integer("rows"));
    this.horizon.push(integer("horizon"));
  }
};

// src/reading/readLossSeriesFile.ts
async function readLossSeriesFile(path, options = {}) {
  const implied = formatFromPath(path);
  const reader = new LossSeriesReader(path, {
    format: options.format ?? implied.format,
    ...options.timestampColumn === void 0 ? {} : { timestampColumn: options.timestampColumn }
  });
  const sha256 = await streamTextFile(path, implied.gzip, reader, options.onProgress);
  return reader.finish(sha256);
}

// src/app/runComparison.ts
async function runComparison(settings, hooks = {}) {
  if (settings.losses !== null)
    return { report: await runOnLossFile(settings.losses, settings, hooks) };
  const read = (path, role) => readForecastFile(path, {
    role,
    columns: settings.columns,
    ...settings.format === "auto" ? {} : { format: settings.format },
    requireActual: role === "actuals" || settings.actuals === null,
    onProgress: (done, total) => hooks.onProgress?.({ stage: `reading ${role}`, fraction: total > 0 ? done / total : 1 })
  });
  const baseline = await read(settings.baseline, "baseline");
  const candidate = await read(settings.candidate, "candidate");
  const actuals = settings.actuals === null ? void 0 : await read(settings.actuals, "actuals");
  hooks.onProgress?.({ stage: "aligning", fraction: 0 });
  const panel = alignPanel(
    { baseline, candidate, ...actuals === void 0 ? {} : { actuals } },
    { onProgress: (fraction) => hooks.onProgress?.({ stage: "aligning", fraction }) }
  );
  const folds = settings.folds === null ? void 0 : await readFoldLayout(settings.folds);
  const integrity = checkBacktest(
    {
      panel,
      baseline,
      candidate,
      ...actuals === void 0 ? {} : { actuals },
      ...folds === void 0 ? {} : { folds }
    },
    { frequency: settings.frequency, embargo: settings.embargo, mode: settings.backtestChecks }
  );
  const history = settings.pooling === "scaled" && settings.scale === "seasonal-naive" ? await readHistory(settings) : void 0;
  hooks.onProgress?.({ stage: "testing", fraction: 0 });
  const report = evaluatePanel(panel, settings, {
    integrity,
    ...history === void 0 ? {} : { history },
    ...hooks.resampleRunner === void 0 ? {} : { resampleRunner: hooks.resampleRunner }
  });
  hooks.onProgress?.({ stage: "testing", fraction: 1 });
  return { report };
}
async function runOnLossFile(path, settings, hooks) {
  if (settings.folds !== null || settings.frequency !== "auto" || settings.embargo !== 0) {
    throw new InputError(
      "frequency, folds and embargo configure the backtest checks, which need the forecast files (baseline and candidate), not a loss file",
      { file: path }
    );
  }
  const table = await readLossSeriesFile(path, {
    ...settings.format === "auto" ? {} : { format: settings.format },
    ...settings.columns.timestamp === void 0 ? {} : { timestampColumn: settings.columns.timestamp },
    onProgress: (done, total) => hooks.onProgress?.({ stage: "reading losses", fraction: total > 0 ? done / total : 1 })
  });
  const { series, timestamps, kind } = orderLossSeries(table);
  return evaluateLossSeries(
    series,
    { file: table.summary, timestamps, kind },
    settings,
    hooks.resampleRunner
  );
}
async function readHistory(settings) {
  if (settings.history === null) {
    throw new InputError("--scale seasonal-naive needs --history FILE (series, timestamp, actual)");
  }
  const table = await readForecastFile(settings.history, {
    role: "actuals",
    columns: settings.columns,
    ...settings.format === "auto" ? {} : { format: settings.format },
    requireActual: true
  });
  return historyBySeries(table);
}

// src/parallel/resamplePool.ts
import { availableParallelism } from "node:os";
import {
  MessageChannel,
  receiveMessageOnPort,
  Worker
} from "node:worker_threads";

// src/parallel/sharedResampleTask.ts
var NEXT_STREAM = 0;
var FINISHED_STREAMS = 1;
var FAILED = 2;
var CONTROL_SLOTS = 3;
function shareResampleJob(job) {
  const prefix = new SharedArrayBuffer(job.prefix.length * Float64Array.BYTES_PER_ELEMENT);
  new Float64Array(prefix).set(job.prefix);
  return {
    prefix,
    out: new SharedArrayBuffer(job.resamples * Float64Array.BYTES_PER_ELEMENT),
    control: new SharedArrayBuffer(CONTROL_SLOTS * Int32Array.BYTES_PER_ELEMENT),
    n: job.n,
    expectedBlockLength: job.expectedBlockLength,
    resamples: job.resamples,
    seed: job.seed
  };
}
function workOnSharedTask(task, reportFailure = () => {
}) {
  const control = new Int32Array(task.control);
  const prefix = new Float64Array(task.prefix);
  const out = new Float64Array(task.out);
  const total = streamCount(task.resamples);
  let sampler = null;
  let streams = null;
  let nextIndex = 0;
  let done = 0;
  for (; ; ) {
    const stream = Atomics.add(control, NEXT_STREAM, 1);
    if (stream >= total) return done;
    try {
      sampler ??= createGeometricSampler(task.expectedBlockLength);
      if (streams === null) {
        streams = createRandomStreams(task.seed, stream);
        nextIndex = stream;
      }
      for (; nextIndex < stream; nextIndex++) streams.next();
      const source = streams.next();
      nextIndex++;
      const { first, count } = streamShare(task.resamples, stream);
      out.set(resampleDeviationsOfStream(prefix, task.n, sampler, source, count), first);
      done++;
    } catch (error) {
      reportFailure(error instanceof Error ? error.message : String(error));
      Atomics.store(control, FAILED, 1);
      throw error;
    } finally {
      Atomics.add(control, FINISHED_STREAMS, 1);
      Atomics.notify(control, FINISHED_STREAMS);
    }
  }
}
function waitForSharedTask(task, describeFailure) {
  const control = new Int32Array(task.control);
  const total = streamCount(task.resamples);
  for (; ; ) {
    const finished = Atomics.load(control, FINISHED_STREAMS);
    if (finished >= total) break;
    Atomics.wait(control, FINISHED_STREAMS, finished);
  }
  if (Atomics.load(control, FAILED) !== 0) {
    throw new Error(`a resampling thread failed: ${describeFailure()}`);
  }
}

// src/parallel/resamplePool.ts
var MINIMUM_PARALLEL_BLOCK_DRAWS = 5e6;
function createResamplePool(options = {}) {
  const workerCount = options.workers ?? Math.max(0, availableParallelism() - 1);
  const minimum = options.minimumBlockDraws ?? MINIMUM_PARALLEL_BLOCK_DRAWS;
  const workerUrl = options.workerUrl ?? new URL("./resampleWorker.js", import.meta.url);
  const workers = [];
  let lastShared = null;
  const start = () => {
    while (workers.length < workerCount) {
      const channel = new MessageChannel();
      const worker = new Worker(workerUrl, {
        workerData: { failures: channel.port2 },
        transferList: [channel.port2]
      });
      worker.unref();
      channel.port1.unref();
      workers.push({ worker, failures: channel.port1 });
    }
  };
  const runner = (job, random) => {
    const blockDraws = job.resamples * (job.n / job.expectedBlockLength + 1);
    if (workerCount === 0 || random !== createRandomSource || blockDraws < minimum) {
      return runResampleJob(job, random);
    }
    start();
    const task = shareResampleJob(job);
    for (const { worker } of workers) worker.postMessage(task);
    const inCallingThread = workOnSharedTask(task);
    waitForSharedTask(task, () => {
      const messages = [];
      for (const { failures } of workers) {
        for (let m = receiveMessageOnPort(failures); m !== void 0; m = receiveMessageOnPort(failures)) {
          messages.push(String(m.message));
        }
      }
      return messages.join("; ") || "no message";
    });
    lastShared = { streams: streamCount(job.resamples), inCallingThread };
    return new Float64Array(task.out).slice();
  };
  return {
    runner,
    get started() {
      return workers.length;
    },
    get lastShared() {
      return lastShared;
    },
    close: async () => {
      const stopping = workers.splice(0).map(({ worker, failures }) => {
        failures.close();
        return worker.terminate();
      });
      await Promise.all(stopping);
    }
  };
}

// src/losses/lossName.ts
var LOSS_NAMES = ["squared", "absolute", "ape", "sape", "pinball", "interval"];
var LOSS_LABELS = {
  squared: "squared error",
  absolute: "absolute error",
  ape: "absolute percentage error (%)",
  sape: "symmetric absolute percentage error (%)",
  pinball: "pinball loss (mean over quantile levels)",
  interval: "interval score of the central interval (Gneiting & Raftery 2007)"
};

// src/report/escapeMarkdown.ts
function escapeMarkdown(text) {
  return text.replace(/[\r\n\t\u2028\u2029]+/g, " ").replace(/[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, "\uFFFD").replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/([\\`*_[\]~|#!])/g, "\\$1").replace(/@/g, "@\u200B").replace(/#/g, "#\u200B").replace(/:(?=\/\/)/g, ":\u200B").replace(/\b(www)\./gi, "$1\u200B.").replace(/\b(GH)-(?=\d)/gi, "$1-\u200B");
}

// src/report/renderBacktestChecks.ts
var SHOWN = 2;
var MAX_CHARS = 200;
var clip = (text) => text.length <= MAX_CHARS ? text : `${text.slice(0, MAX_CHARS)}\u2026`;
var CHECK_LABELS = {
  "look-ahead": "origin at or after the timestamp",
  "horizon-steps": "horizon differs from the steps from origin to timestamp",
  "origin-after-actuals": "issued after the last actual",
  "origin-sets": "origins in one file only",
  "path-sets": "paths in one file only",
  "horizon-sets": "horizons in one file only",
  "time-spans": "timestamps outside the other file's span",
  "series-coverage": "series in one file only",
  "fold-purge": "training within the purge or embargo window",
  "outside-test-window": "rows outside their fold's test window",
  "exact-predictions": "predictions equal to the actual far more often than the other model"
};
function backtestChecksSection(report) {
  const integrity = report.integrity;
  if (integrity.checks.length === 0 && integrity.notRun.length > 0) {
    const reasons = [...new Set(integrity.notRun.map((n) => n.reason))];
    return [`**Backtest checks**: not run (${reasons.map(escapeMarkdown).join("; ")}).`, ""];
  }
  const mode = integrity.mode === "report" ? " Shown only: they do not change the verdict (backtest-checks report)." : integrity.mode === "warn" ? " Findings warn (backtest-checks warn)." : "";
  const step = integrity.frequency === null ? "" : ` Steps of ${escapeMarkdown(integrity.frequency.text)} (${integrity.frequency.source}).`;
  const out = [`**Backtest checks**: ${integrity.outcome}.${step}${mode}`, ""];
  for (const check of integrity.checks) out.push(`- ${checkLine(check)}`);
  for (const n of integrity.notRun) out.push(`- not run \xB7 ${n.id}: ${escapeMarkdown(n.reason)}`);
  out.push("");
  return out;
}
function checkLine(check) {
  const shown = check.examples.slice(0, SHOWN).map((e) => escapeMarkdown(clip(e)));
  const examples = shown.length === 0 ? "" : `, e.g. ${shown.join("; ")}`;
  return `${check.status} \xB7 ${check.id} (${CHECK_LABELS[check.id]}): ${check.count}${examples}`;
}
function backtestChecksLines(report, clean3) {
  const integrity = report.integrity;
  if (integrity.checks.length === 0) return [];
  const flagged = integrity.checks.filter((c) => c.status !== "ok");
  const out = [
    `backtest checks: ${integrity.outcome} (${integrity.checks.length} run, ${integrity.notRun.length} not run)`
  ];
  for (const c of flagged) {
    const eg = c.examples.slice(0, SHOWN).map((e) => clean3(clip(e))).join("; ");
    out.push(`  ${c.status} ${c.id}: ${c.count}${eg === "" ? "" : `, e.g. ${eg}`}`);
  }
  return out;
}

// src/report/renderStabilitySection.ts
function renderStabilitySection(report) {
  const stability = report.stability;
  const overall = report.comparisons[0];
  if (stability === null || overall === void 0) return [];
  const out = ["**Over time**", ""];
  if (stability.recent !== null) out.push(...windowTable(overall, stability.recent), "");
  out.push(fluctuationSentence(stability, report), "");
  if (stability.periods.length > 0) out.push(...periodTable(stability), "");
  return out;
}
function windowTable(overall, recent) {
  const level = recent.relativeChange?.level;
  const head = level === void 0 ? "relative" : `relative [${formatNumber(level * 100, 3)}% interval]`;
  const row = (name, c) => `| ${name} | ${escapeMarkdown(c.firstTimestamp ?? "n/a")} to ${escapeMarkdown(c.lastTimestamp ?? "n/a")} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${relativeChangeText(c)} | ${formatPValue(c.dieboldMariano.decisionPValue)} | ${formatPValue(c.bootstrap.decisionPValue)} | ${c.verdict} |`;
  return [
    `| window | from \u2013 to | time points | baseline loss | candidate loss | ${head} | p (DM) | p (bootstrap) | verdict |`,
    "|---|---|---:|---:|---:|---:|---:|---:|---|",
    row("whole backtest", overall),
    row("most recent", recent)
  ];
}
function fluctuationSentence(stability, report) {
  const f = stability.fluctuation;
  if (f === null) {
    return "Fluctuation test: not run (it needs at least 20 time points, a non-zero long-run variance and \u03B1 between 0.01 and 0.10).";
  }
  const sides = report.settings.fluctuationSides === "one" ? "one-sided" : "two-sided";
  const setup = `Fluctuation test (Giacomini & Rossi 2010, ${sides}): the Diebold\u2013Mariano statistic over rolling windows of ${f.windowSize} time points (\u03BC = ${f.mu}); its largest value ${formatNumber(f.statistic, 3)} against the critical value ${formatNumber(f.criticalValue, 4)} at \u03B1 = ${report.policy.alpha}, over ${escapeMarkdown(f.peak.start)} to ${escapeMarkdown(f.peak.end)}.`;
  if (f.worsePeriods.length > 0) {
    const spans = f.worsePeriods.map((s) => `${escapeMarkdown(s.start)} to ${escapeMarkdown(s.end)}`).join(", ");
    return `${setup} The candidate is significantly worse over ${spans}.`;
  }
  return f.rejected ? `${setup} Accuracy is not equal throughout, but in no stretch is the candidate significantly worse.` : `${setup} No stretch where the candidate is significantly worse.`;
}
function periodTable(stability) {
  const out = [
    `<details><summary>Mean loss by period (${stability.periods.length} periods)</summary>`,
    "",
    "| period | time points | baseline loss | candidate loss | relative |",
    "|---|---:|---:|---:|---:|"
  ];
  for (const p of stability.periods) {
    const span = p.start === p.end ? escapeMarkdown(p.start) : `${escapeMarkdown(p.start)} to ${escapeMarkdown(p.end)}`;
    out.push(
      `| ${span} | ${p.n} | ${formatNumber(p.meanBaselineLoss)} | ${formatNumber(p.meanCandidateLoss)} | ${formatSignedPercent(p.relativeDifference)} |`
    );
  }
  out.push("", "</details>");
  return out;
}

// src/report/renderMarkdown.ts
var VERDICT_WORDS = { pass: "PASS", warn: "WARN", fail: "FAIL" };
function renderMarkdown(report, options = {}) {
  const lines = [];
  const title = report.name === "" ? "skillgate" : `skillgate \xB7 ${escapeMarkdown(report.name)}`;
  lines.push(`### ${title}: ${VERDICT_WORDS[report.verdict]}`, "");
  lines.push(escapeMarkdown(report.headline), "");
  lines.push(...comparisonTable(report), "");
  lines.push(`<sub>${escapeMarkdown(intervalNote(report))}</sub>`, "");
  lines.push(...seriesSection(report));
  lines.push(...pathSection(report));
  lines.push(...renderStabilitySection(report));
  lines.push(...backtestChecksSection(report));
  const reasons = [...report.reasons, ...report.comparisons[0]?.reasons ?? []];
  if (reasons.length > 0) {
    lines.push("**Why**", "");
    for (const r of reasons) lines.push(`- ${escapeMarkdown(r)}`);
    lines.push("");
  }
  lines.push(...testDetails(report), "");
  lines.push(...inputSection(report), "");
  lines.push(...settingsSection(report), "");
  lines.push(
    `<sub>A pass is evidence, not proof: it is only as good as the backtest behind it. Generated by skillgate ${escapeMarkdown(report.tool.version)}.${options.runUrl === void 0 ? "" : ` [Run details](${options.runUrl})`}</sub>`
  );
  return `${lines.join("\n")}
`;
}
function scopeLabel(c) {
  if (c.horizon === "all" && c.series === "all") return "overall";
  const parts = [];
  if (c.horizon !== "all") parts.push(`horizon ${c.horizon}`);
  if (c.series !== "all") parts.push(`series ${escapeMarkdown(c.series)}`);
  return parts.join(", ");
}
function comparisonTable(report) {
  const level = report.comparisons[0]?.bootstrap.interval?.level ?? report.settings.confidence;
  const pct = `${formatNumber(level * 100, 3)}%`;
  const rows = [
    `| comparison | time points | baseline loss | candidate loss | difference | relative | DM statistic | p (DM) | p (bootstrap) | ${pct} interval (bootstrap) | verdict |`,
    "|---|---:|---:|---:|---:|---:|---:|---:|---:|---|---|"
  ];
  for (const c of report.comparisons.filter((x) => x.series === "all" && x.path === void 0)) {
    const dm = c.dieboldMariano;
    const bs = c.bootstrap;
    const interval = bs.interval === null ? "n/a" : `[${formatNumber(bs.interval.lower)}, ${formatNumber(bs.interval.upper)}]`;
    rows.push(
      `| ${scopeLabel(c)} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(
        c.meanCandidateLoss
      )} | ${formatNumber(c.meanDifference)} | ${relativeCell(c)} | ${formatNumber(
        dm.smallSample?.statistic ?? dm.statistic
      )} | ${formatPValue(dm.decisionPValue)} | ${formatPValue(bs.decisionPValue)} | ${interval} | ${c.verdict} |`
    );
  }
  return rows;
}
function relativeCell(c) {
  return relativeChangeText(c);
}
function seriesSection(report) {
  const summary = report.seriesSummary;
  if (summary === null) return [];
  const method = summary.method === "holm" ? "Holm" : "Benjamini\u2013Hochberg";
  const out = [
    `**Series**: of ${summary.series}, ${summary.worse} worse, ${summary.better} better, ${summary.noEvidence} without evidence either way (Diebold\u2013Mariano per series, ${method}-adjusted, \u03B1 = ${summary.alpha}). These locate a regression; the verdict rests on the overall comparison.`,
    ""
  ];
  const byName = new Map(
    report.comparisons.filter((c) => c.series !== "all").map((c) => [c.series, c])
  );
  const top = summary.topRegressions.map((name) => byName.get(name)).filter((c) => c !== void 0);
  if (top.length > 0) {
    out.push(
      `| series (largest significant regressions) | time points | baseline loss | candidate loss | relative | DM statistic | adjusted p |`,
      "|---|---:|---:|---:|---:|---:|---:|"
    );
    for (const c of top) {
      out.push(
        `| ${escapeMarkdown(String(c.series))} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${formatSignedPercent(c.relativeDifference)} | ${formatNumber(c.dieboldMariano.smallSample?.statistic ?? c.dieboldMariano.statistic)} | ${formatPValue(c.adjustedPValue)} |`
      );
    }
    out.push("");
  }
  return out;
}
function pathSection(report) {
  const summary = report.pathSummary;
  if (summary === null) return [];
  const out = [
    `**Backtest paths**: the candidate's mean loss is higher on ${summary.worse} of ${summary.paths} paths (${formatNumber(summary.shareWorse * 100, 3)}%), significantly so (one-sided Diebold\u2013Mariano, p \u2264 ${report.policy.alpha}) on ${summary.significantlyWorse}. The verdict tests the path-averaged differential.`,
    ""
  ];
  const rows = report.comparisons.filter((c) => c.path !== void 0);
  if (rows.length <= 50) {
    out.push(
      "| path | time points | baseline loss | candidate loss | relative | DM statistic | p (DM) |"
    );
    out.push("|---|---:|---:|---:|---:|---:|---:|");
    for (const c of rows) {
      const dm = c.dieboldMariano;
      out.push(
        `| ${escapeMarkdown(c.path ?? "")} | ${c.n} | ${formatNumber(c.meanBaselineLoss)} | ${formatNumber(c.meanCandidateLoss)} | ${formatSignedPercent(c.relativeDifference)} | ${formatNumber(dm.smallSample?.statistic ?? dm.statistic)} | ${formatPValue(dm.smallSample?.pValue ?? dm.pValue)} |`
      );
    }
  }
  out.push("");
  return out;
}
function testDetails(report) {
  const c = report.comparisons[0];
  if (c === void 0) return [];
  const dm = c.dieboldMariano;
  const bs = c.bootstrap;
  const out = ["<details><summary>How the overall comparison was tested</summary>", ""];
  out.push(
    `Loss: ${LOSS_LABELS[c.loss]}. Tested differential: d_t = L_candidate \u2212 ${formatNumber(
      report.policy.baselineFactor,
      6
    )} \xB7 L_baseline (mean ${formatNumber(c.meanTestedDifferential)}), H0 boundary \u03B4 = ${formatNumber(
      report.policy.boundary
    )}.`,
    "",
    `H0: ${escapeMarkdown(report.policy.nullHypothesis)}. H1: ${escapeMarkdown(report.policy.alternative)}. Rejecting H0 makes the gate ${report.policy.onReject}.`,
    "",
    "| | value |",
    "|---|---|",
    `| Diebold\u2013Mariano variance | ${dm.estimator}${dm.estimator === dm.requestedEstimator ? "" : ` (requested ${dm.requestedEstimator})`} |`,
    `| statistic | ${formatNumber(dm.statistic)} |`,
    `| long-run variance \u03C9\u0302\xB2 | ${formatNumber(dm.longRunVariance)} |`,
    `| lag | ${dm.lag ?? "n/a (fixed-b)"} |`,
    `| degrees of freedom | ${dm.degreesOfFreedom ?? "normal reference"} |`
  );
  if (dm.smallSample !== null) {
    out.push(
      `| Harvey\u2013Leybourne\u2013Newbold statistic | ${formatNumber(dm.smallSample.statistic)} (t, ${dm.smallSample.degreesOfFreedom} df) |`
    );
  }
  out.push(
    `| p one-sided (worse) / two-sided | ${formatPValue(dm.pValue)} / ${formatPValue(dm.pValueTwoSided)} |`
  );
  if (dm.interval !== null) {
    out.push(
      `| DM interval for E[L_candidate \u2212 L_baseline] (${formatNumber(dm.interval.level * 100, 3)}%) | [${formatNumber(dm.interval.lower)}, ${formatNumber(dm.interval.upper)}] |`
    );
  }
  out.push(
    `| bootstrap expected block length | ${formatNumber(bs.expectedBlockLength)} (${bs.blockLengthRule}) |`,
    `| bootstrap resamples / seed | ${bs.resamples} / ${bs.seed} |`,
    `| bootstrap standard error of d\u0304 | ${formatNumber(bs.standardError)} |`,
    `| bootstrap p one-sided (worse) / two-sided | ${formatPValue(bs.pValue)} / ${formatPValue(bs.pValueTwoSided)} |`
  );
  const coverage = report.inputs.intervalCoverage;
  if (coverage !== null) {
    out.push(
      `| empirical coverage of the ${formatNumber(coverage.nominal * 100, 3)}% interval, baseline / candidate | ${formatSignedPercent(coverage.baseline).replace("+", "")} / ${formatSignedPercent(coverage.candidate).replace("+", "")} |`
    );
  }
  for (const note of [...dm.notes, ...bs.notes]) out.push("", `Note: ${escapeMarkdown(note)}`);
  out.push("", "</details>");
  return out;
}
function inputSection(report) {
  const i = report.inputs;
  const out = ["<details><summary>Inputs and coverage</summary>", ""];
  out.push(
    "| file | role | rows | blank lines skipped | columns not used | sha256 |",
    "|---|---|---:|---:|---|---|"
  );
  for (const f of i.files) {
    const unused = f.ignoredColumns.length === 0 ? "" : f.ignoredColumns.map(escapeMarkdown).join(", ");
    out.push(
      `| ${escapeMarkdown(f.path)} | ${f.role} | ${f.rows} | ${f.blankLines} | ${unused} | \`${f.sha256.replace(/^sha256:/, "").slice(0, 12)}\` |`
    );
  }
  const d = i.rowsDropped;
  out.push(
    "",
    `Rows matched: ${i.rowsMatched} over ${i.timestamps.count} timestamps (${escapeMarkdown(i.timestamps.first ?? "n/a")} to ${escapeMarkdown(
      i.timestamps.last ?? "n/a"
    )}), ${i.series} series, horizons ${i.horizons.join(", ") || "1"}.`,
    `Left out: ${d.baseline} baseline rows the candidate lacks, ${d.candidate} candidate rows the baseline lacks, ${d.withoutActual} rows without an actual, ${d.actualsUnused} unused actuals, ${d.skippedByLoss} rows skipped by the loss.`
  );
  if (i.examples.baselineOnly.length > 0) {
    out.push(
      `Examples the candidate lacks: ${i.examples.baselineOnly.map((k) => escapeMarkdown(k)).join(", ")}.`
    );
  }
  out.push("", "</details>");
  return out;
}
function settingsSection(report) {
  const out = [
    "<details><summary>Settings in force</summary>",
    "",
    "| setting | value |",
    "|---|---|"
  ];
  for (const [key, value] of Object.entries(report.settings)) {
    const text = typeof value === "object" && value !== null ? JSON.stringify(value) : String(value);
    out.push(`| ${key} | ${escapeMarkdown(text)} |`);
  }
  out.push("", "</details>");
  return out;
}

// src/report/renderStabilityTerminal.ts
function renderStabilityTerminal(report) {
  const s = report.stability;
  if (s === null) return [];
  const out = [];
  const r = s.recent;
  if (r !== null) {
    out.push(
      `recent window: ${r.n} time points ${clean(r.firstTimestamp ?? "?")} to ${clean(r.lastTimestamp ?? "?")}, relative ${relativeChangeText(r)}, p (DM) ${formatPValue(r.dieboldMariano.decisionPValue)}, p (boot) ${formatPValue(r.bootstrap.decisionPValue)}: ${r.verdict}`
    );
  }
  const f = s.fluctuation;
  if (f !== null) {
    out.push(
      `fluctuation test: max ${formatNumber(f.statistic, 3)} vs ${formatNumber(f.criticalValue, 4)} (windows of ${f.windowSize}, \u03BC = ${f.mu}); ${f.worsePeriods.length === 0 ? "no stretch significantly worse" : `worse over ${f.worsePeriods.map((w) => `${clean(w.start)} to ${clean(w.end)}`).join(", ")}`}`
    );
  }
  return out;
}
function clean(text) {
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, " ");
}

// src/report/renderTerminal.ts
function renderTerminal(report, options) {
  const paint = (code, text) => options.color ? `\x1B[${code}m${text}\x1B[0m` : text;
  const verdictColor = { pass: "32", warn: "33", fail: "31" }[report.verdict];
  const title = report.name === "" ? "skillgate" : `skillgate \xB7 ${clean2(report.name)}`;
  const out = [];
  out.push(`${paint("1", title)}: ${paint(`1;${verdictColor}`, report.verdict.toUpperCase())}`);
  out.push(wrap(report.headline, 100), "");
  const header = [
    "comparison",
    "n",
    "baseline",
    "candidate",
    "diff",
    "relative",
    "p (DM)",
    "p (boot)",
    "interval (boot)",
    "verdict"
  ];
  const rows = report.comparisons.filter((c) => c.series === "all" && c.path === void 0).map((c) => [
    scope(c),
    String(c.n),
    formatNumber(c.meanBaselineLoss),
    formatNumber(c.meanCandidateLoss),
    formatNumber(c.meanDifference),
    relativeChangeText(c),
    formatPValue(c.dieboldMariano.decisionPValue),
    formatPValue(c.bootstrap.decisionPValue),
    c.bootstrap.interval === null ? "n/a" : `[${formatNumber(c.bootstrap.interval.lower)}, ${formatNumber(c.bootstrap.interval.upper)}]`,
    c.verdict
  ]);
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? "").length)));
  const line = (cells) => cells.map((cell, j) => j === 0 || j >= 8 ? cell.padEnd(widths[j]) : cell.padStart(widths[j])).join("  ");
  out.push(paint("2", line(header)));
  for (const r of rows) out.push(line(r));
  out.push(...renderStabilityTerminal(report));
  out.push(wrap(intervalNote(report), 100), "");
  for (const reason of [...report.reasons, ...report.comparisons[0]?.reasons ?? []]) {
    out.push(wrap(`- ${reason}`, 100, "  "));
  }
  const summary = report.seriesSummary;
  if (summary !== null) {
    const top = summary.topRegressions.slice(0, 5).map(clean2).join(", ");
    out.push(
      `series: ${summary.worse} worse, ${summary.better} better, ${summary.noEvidence} no evidence (${summary.method}-adjusted)${top === "" ? "" : `; largest regressions: ${top}`}`
    );
  }
  const paths = report.pathSummary;
  if (paths !== null) {
    out.push(
      `paths: candidate worse on ${paths.worse} of ${paths.paths} (${paths.significantlyWorse} significantly)`
    );
  }
  out.push(...backtestChecksLines(report, clean2));
  const i = report.inputs;
  out.push(
    "",
    paint(
      "2",
      `rows matched ${i.rowsMatched}; left out: ${i.rowsDropped.baseline} baseline-only, ${i.rowsDropped.candidate} candidate-only, ${i.rowsDropped.withoutActual} without actual, ${i.rowsDropped.skippedByLoss} skipped by loss`
    )
  );
  return `${out.join("\n")}
`;
}
function scope(c) {
  if (c.horizon === "all" && c.series === "all") return "overall";
  const parts = [];
  if (c.horizon !== "all") parts.push(`h=${c.horizon}`);
  if (c.series !== "all") parts.push(clean2(c.series));
  return parts.join(" ");
}
function clean2(text) {
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, " ");
}
function wrap(text, width, indent = "") {
  const words = clean2(text).split(" ");
  const lines = [];
  let current = "";
  for (const w of words) {
    if (current !== "" && current.length + 1 + w.length > width) {
      lines.push(current);
      current = indent + w;
    } else {
      current = current === "" ? w : `${current} ${w}`;
    }
  }
  if (current !== "") lines.push(current);
  return lines.join("\n");
}

// src/settings/options.ts
var ENGINE_OPTIONS = [
  {
    name: "baseline",
    valueName: "FILE",
    defaultValue: null,
    required: true,
    help: "predictions of the model on the main branch (CSV/TSV, optionally .gz)"
  },
  {
    name: "candidate",
    valueName: "FILE",
    defaultValue: null,
    required: true,
    help: "predictions of the pull request's model"
  },
  {
    name: "losses",
    valueName: "FILE",
    defaultValue: null,
    help: "instead of baseline and candidate: a pre-aggregated file with timestamp, baseline_loss, candidate_loss (optional differential, rows, horizon) per time point"
  },
  {
    name: "actuals",
    valueName: "FILE",
    defaultValue: null,
    help: "observed values keyed by series and timestamp, when the prediction files lack an actual column"
  },
  {
    name: "columns",
    valueName: "ROLE=HEADER,\u2026",
    defaultValue: "",
    help: "rename columns, e.g. actual=observed,prediction=point,series=zone"
  },
  {
    name: "format",
    defaultValue: "auto",
    choices: ["auto", "csv", "tsv"],
    help: "input format; auto: TSV for .tsv/.tsv.gz, else CSV"
  },
  {
    name: "loss",
    defaultValue: "squared",
    choices: LOSS_NAMES,
    help: "loss per row: squared, absolute, ape (absolute percentage), sape (symmetric), pinball (quantile columns), interval (interval score of --interval)"
  },
  {
    name: "zero-actuals",
    defaultValue: "error",
    choices: ["error", "skip"],
    help: "with ape: refuse rows whose actual is 0, or skip and count them"
  },
  {
    name: "alpha",
    valueName: "NUMBER",
    defaultValue: "0.05",
    help: "significance level of each one-sided test"
  },
  {
    name: "margin",
    valueName: "NUMBER",
    defaultValue: "0",
    help: "allowed margin: with --margin-kind relative, 0.02 means the candidate may be up to 2% worse"
  },
  {
    name: "margin-kind",
    defaultValue: "relative",
    choices: ["relative", "absolute"],
    help: "relative (fraction of the baseline loss) or absolute (loss units)"
  },
  {
    name: "policy",
    defaultValue: "no-regression",
    choices: ["no-regression", "non-inferiority", "superiority"],
    help: "no-regression: fail only on evidence the candidate is worse than the margin; non-inferiority: pass only on evidence it is not; superiority: pass only on evidence it is better by the margin"
  },
  {
    name: "agreement",
    defaultValue: "both",
    choices: ["both", "either", "dm", "bootstrap"],
    help: "which tests must reject for the decision; with both, a split verdict is a warning"
  },
  {
    name: "variance",
    defaultValue: "ewc-ar1",
    choices: ["ewc-ar1", "ewc", "bartlett", "uniform"],
    help: "long-run variance for Diebold\u2013Mariano: ewc-ar1 (equal-weighted cosine, fixed-b, cosine terms from the data), ewc (the same with 0.4\xB7n^(2/3) terms), bartlett (Newey\u2013West), uniform"
  },
  {
    name: "lag",
    valueName: "auto|h-1|N",
    defaultValue: "auto",
    help: "HAC lag for bartlett/uniform: auto (Newey\u2013West 1994, at least h\u22121), h-1, or a number"
  },
  {
    name: "block-length",
    valueName: "auto|N",
    defaultValue: "auto",
    help: "expected block length of the stationary bootstrap: auto (Politis\u2013White) or a number \u2265 1"
  },
  { name: "resamples", valueName: "N", defaultValue: "9999", help: "bootstrap resamples" },
  {
    name: "seed",
    valueName: "N",
    defaultValue: "1729",
    help: "seed of the bootstrap random numbers (same seed, same numbers on every machine)"
  },
  {
    name: "confidence",
    valueName: "NUMBER",
    defaultValue: "",
    help: "level of the intervals in the report; default 1 \u2212 2\xB7alpha (0.9 for alpha 0.05), so each end is the one-sided bound of the tests and the interval shows the decision at any margin; another level may disagree with the tests"
  },
  {
    name: "min-points",
    valueName: "N",
    defaultValue: "30",
    help: "fewest time points for a firm verdict (fewer: too little data)"
  },
  {
    name: "short-data",
    defaultValue: "warn",
    choices: ["warn", "fail"],
    help: "verdict when there are fewer time points than --min-points"
  },
  {
    name: "allow-missing",
    defaultValue: "false",
    flag: true,
    help: "let the gate pass although the candidate lacks rows the baseline has"
  },
  {
    name: "interval",
    valueName: "LOWER,UPPER",
    defaultValue: "",
    help: "with --loss interval: the two quantile levels of the central interval, e.g. 0.1,0.9 (an 80% interval)"
  },
  {
    name: "pooling",
    defaultValue: "raw",
    choices: ["raw", "scaled"],
    help: "pool raw losses across series, or losses divided by a per-series scale (so no large series dominates)"
  },
  {
    name: "scale",
    defaultValue: "baseline",
    choices: ["baseline", "seasonal-naive"],
    help: "with --pooling scaled: each series' mean baseline loss, or the in-sample error of the seasonal naive forecast on --history (as in MASE)"
  },
  {
    name: "history",
    valueName: "FILE",
    defaultValue: null,
    help: "in-sample history (series, timestamp, actual) for --scale seasonal-naive"
  },
  {
    name: "season",
    valueName: "N",
    defaultValue: "1",
    help: "period m of the seasonal naive forecast for --scale seasonal-naive (1: naive)"
  },
  {
    name: "weights",
    defaultValue: "false",
    flag: true,
    help: "weight rows by the weight column when averaging losses per time point"
  },
  {
    name: "adjust",
    defaultValue: "holm",
    choices: ["holm", "bh"],
    help: "multiplicity adjustment of the per-series p-values: holm (family-wise error) or bh (false discovery rate)"
  },
  {
    name: "top",
    valueName: "N",
    defaultValue: "10",
    help: "how many series with the largest significant regressions to list"
  },
  {
    name: "recent",
    valueName: "N|P%",
    defaultValue: "",
    help: "also compare on the most recent window: the last N time points, or the last P% of them (e.g. 15%)"
  },
  {
    name: "fluctuation-window",
    valueName: "MU",
    defaultValue: "0.2",
    help: "window of the fluctuation test (Giacomini\u2013Rossi) as a fraction of the time points, 0.1 to 0.9"
  },
  {
    name: "fluctuation-sides",
    defaultValue: "one",
    choices: ["one", "two"],
    help: "fluctuation test against a candidate worse in some stretch (one) or a difference of either sign (two)"
  },
  {
    name: "stability-gate",
    defaultValue: "warn",
    choices: ["off", "warn", "fail"],
    help: "what a candidate significantly worse recently or in some stretch does to the gate: nothing, warn, or fail"
  },
  {
    name: "frequency",
    valueName: "auto|STEP",
    defaultValue: "auto",
    help: "step of the time grid for the backtest checks: auto (inferred from the timestamps), a count and unit (s, min, h, d, bd for business days, w, mo, q, y; e.g. 1h, 1d, 1mo), or a number for numeric timestamps"
  },
  {
    name: "folds",
    valueName: "FILE",
    defaultValue: null,
    help: "fold layout (fold or path, role train|test, start, end; one row per segment) to check purging, embargo and that every row lies in its test window"
  },
  {
    name: "embargo",
    valueName: "N",
    defaultValue: "0",
    help: "with --folds: steps after each test window that training must also avoid"
  },
  {
    name: "backtest-checks",
    defaultValue: "enforce",
    choices: ["enforce", "warn", "report"],
    help: "enforce: look-ahead and rows outside their test window fail the gate, other findings warn; warn: every finding warns; report: findings are shown but leave the verdict alone"
  },
  {
    name: "name",
    valueName: "TEXT",
    defaultValue: "",
    help: "a name for this comparison (report title; keeps two gates apart on one pull request)"
  },
  {
    name: "json",
    valueName: "FILE",
    defaultValue: null,
    help: "write the JSON report to this file"
  },
  {
    name: "markdown",
    valueName: "FILE",
    defaultValue: null,
    help: "write the Markdown report to this file"
  }
];

// src/settings/resolveSettings.ts
function resolveSettings(raw, label) {
  const value = (name) => {
    const spec = specOf(name);
    const given = raw[name];
    const text = given === void 0 || given === "" ? spec.defaultValue : given.trim();
    if (text === null || spec.required && text === "") {
      throw new InputError(`${label(name)} is required: ${spec.help}`);
    }
    if (spec.choices !== void 0 && !spec.choices.includes(text)) {
      throw new InputError(`${label(name)} must be one of ${spec.choices.join(", ")}`, {
        value: text
      });
    }
    return text;
  };
  const optional = (name) => {
    const given = raw[name]?.trim();
    return given === void 0 || given === "" ? null : given;
  };
  const number = (name, check, expected) => {
    const text = value(name);
    const x = Number(text);
    if (text === "" || !Number.isFinite(x) || !check(x)) {
      throw new InputError(`${label(name)} must be ${expected}`, { value: text });
    }
    return x;
  };
  const integer = (name, min, max = Number.MAX_SAFE_INTEGER) => number(
    name,
    (x) => Number.isInteger(x) && x >= min && x <= max,
    `an integer from ${min} to ${max}`
  );
  const bool = (name) => {
    const text = value(name).toLowerCase();
    if (text === "true") return true;
    if (text === "false") return false;
    throw new InputError(`${label(name)} must be true or false`, { value: text });
  };
  const losses = optional("losses");
  if (losses !== null) {
    for (const name of ["baseline", "candidate", "actuals"]) {
      if (optional(name) !== null) {
        throw new InputError(
          `${label("losses")} replaces ${label("baseline")} and ${label("candidate")}; give one or the other`,
          {
            value: name
          }
        );
      }
    }
  }
  const alpha = number(
    "alpha",
    (x) => x > 0 && x < 0.5,
    "a number between 0 and 0.5, such as 0.05"
  );
  return {
    name: value("name"),
    baseline: losses === null ? value("baseline") : "",
    candidate: losses === null ? value("candidate") : "",
    losses,
    actuals: optional("actuals"),
    columns: parseColumnMapping(value("columns"), label("columns")),
    format: value("format"),
    loss: value("loss"),
    zeroActuals: value("zero-actuals"),
    alpha,
    margin: number("margin", (x) => x >= 0, "a number \u2265 0 (0.02 = 2% with --margin-kind relative)"),
    marginKind: value("margin-kind"),
    policy: value("policy"),
    agreement: value("agreement"),
    variance: value("variance"),
    lag: parseLag(value("lag"), label("lag")),
    blockLength: parseBlockLength(value("block-length"), label("block-length")),
    resamples: integer("resamples", 99, 1e7),
    seed: integer("seed", 0, 2 ** 31 - 1),
    confidence: optional("confidence") === null ? defaultConfidence(alpha) : number("confidence", (x) => x > 0.5 && x < 1, "a number between 0.5 and 1, such as 0.9"),
    minPoints: integer("min-points", 1),
    shortData: value("short-data"),
    allowMissing: bool("allow-missing"),
    interval: parseInterval(value("interval"), label("interval"), value("loss") === "interval"),
    pooling: value("pooling"),
    scale: value("scale"),
    history: optional("history"),
    season: integer("season", 1),
    weights: bool("weights"),
    adjust: value("adjust"),
    top: integer("top", 0, 1e4),
    recent: parseRecentWindow(value("recent"), label("recent")),
    fluctuationWindow: number(
      "fluctuation-window",
      (x) => x >= 0.1 && x <= 0.9,
      "a number from 0.1 to 0.9 (the window as a fraction of the time points)"
    ),
    fluctuationSides: value("fluctuation-sides"),
    stabilityGate: value("stability-gate"),
    frequency: parseFrequencyOption(value("frequency"), label("frequency")),
    folds: optional("folds"),
    embargo: integer("embargo", 0, 1e6),
    backtestChecks: value("backtest-checks"),
    json: optional("json"),
    markdown: optional("markdown")
  };
}
function specOf(name) {
  const spec = ENGINE_OPTIONS.find((o) => o.name === name);
  if (spec === void 0) throw new Error(`unknown option ${name}`);
  return spec;
}
function parseInterval(text, label, needed) {
  if (text === "") {
    if (needed) throw new InputError(`${label} is required with the interval loss, e.g. 0.1,0.9`);
    return null;
  }
  const parts = text.split(",").map((p) => Number(p.trim()));
  const [lower, upper] = parts;
  if (parts.length !== 2 || lower === void 0 || upper === void 0 || !(lower > 0 && lower < upper && upper < 1) || Math.abs(lower + upper - 1) > 1e-9) {
    throw new InputError(
      `${label} takes two quantile levels of a central interval, lower,upper with lower + upper = 1 (e.g. 0.1,0.9)`,
      { value: text }
    );
  }
  return [lower, upper];
}
function parseLag(text, label) {
  if (text === "auto") return { kind: "auto" };
  if (text === "h-1") return { kind: "horizon" };
  const lag = Number(text);
  if (!Number.isInteger(lag) || lag < 0) {
    throw new InputError(`${label} must be auto, h-1 or an integer \u2265 0`, { value: text });
  }
  return { kind: "fixed", lag };
}
function parseBlockLength(text, label) {
  if (text === "auto") return { kind: "auto" };
  const length = Number(text);
  if (!Number.isFinite(length) || length < 1) {
    throw new InputError(`${label} must be auto or a number \u2265 1`, { value: text });
  }
  return { kind: "fixed", length };
}
function parseFrequencyOption(text, label) {
  if (text === "auto" || parseFrequency(text) !== null) return text;
  throw new InputError(`${label} must be ${FREQUENCY_SYNTAX}`, { value: text });
}

// src/cli/helpText.ts
function helpText() {
  const lines = [
    `skillgate ${VERSION}: is the candidate forecasting model worse than the baseline?`,
    "",
    "Usage:",
    "  skillgate compare --baseline FILE --candidate FILE [options]",
    "  skillgate --help | --version",
    "",
    "Options:"
  ];
  for (const o of ENGINE_OPTIONS) {
    const flag = o.flag ? `--${o.name}` : `--${o.name} ${o.choices ? o.choices.join("|") : o.valueName ?? "VALUE"}`;
    const dflt = o.defaultValue === null || o.defaultValue === "" || o.flag ? "" : ` (default ${o.defaultValue})`;
    lines.push(`  ${flag}`, `      ${o.help}${dflt}`);
  }
  lines.push(
    "  --quiet",
    "      print nothing but errors on the terminal (the exit code still carries the verdict)",
    "",
    "Exit codes: 0 the gate passes (warnings allowed), 1 the gate fails, 2 usage or input error.",
    ""
  );
  return lines.join("\n");
}

// src/cli/parseArguments.ts
import { parseArgs } from "node:util";
function parseArguments(argv) {
  if (argv.length === 0 || argv.includes("--help") || argv.includes("-h") || argv[0] === "help") {
    return { kind: "help" };
  }
  if (argv.includes("--version")) return { kind: "version" };
  const [command, ...rest] = argv;
  if (command !== "compare") {
    throw new InputError(
      `unknown command "${command}"; the command is "compare" (see skillgate --help)`
    );
  }
  const spec = { quiet: { type: "boolean" } };
  for (const o of ENGINE_OPTIONS) spec[o.name] = { type: o.flag ? "boolean" : "string" };
  let values;
  try {
    ({ values } = parseArgs({
      args: [...rest],
      options: spec,
      strict: true,
      allowPositionals: false
    }));
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    throw new InputError(`${message.replace(/\.$/, "")}; see skillgate --help`);
  }
  const options = {};
  for (const o of ENGINE_OPTIONS) {
    const v = values[o.name];
    options[o.name] = typeof v === "boolean" ? String(v) : v;
  }
  return { kind: "compare", options, quiet: values.quiet === true };
}

// src/cli/progressReporter.ts
function progressReporter(stream) {
  if (stream.isTTY !== true) return { update: () => {
  }, done: () => {
  } };
  let last = 0;
  let shown = false;
  return {
    update: (p) => {
      const now = Date.now();
      if (now - last < 100 && p.fraction < 1) return;
      last = now;
      shown = true;
      const pct = Math.round(Math.max(0, Math.min(1, p.fraction)) * 100);
      stream.write(`\r\x1B[2K${p.stage} ${pct}%`);
    },
    done: () => {
      if (shown) stream.write("\r\x1B[2K");
    }
  };
}

// src/cli/main.ts
async function main(argv) {
  try {
    const request = parseArguments(argv);
    if (request.kind === "help") {
      process.stdout.write(helpText());
      return 0;
    }
    if (request.kind === "version") {
      process.stdout.write(`${VERSION}
`);
      return 0;
    }
    const settings = resolveSettings(request.options, (name) => `--${name}`);
    const progress = progressReporter(process.stderr);
    const pool = createResamplePool();
    const { report } = await runComparison(settings, {
      onProgress: progress.update,
      resampleRunner: pool.runner
    });
    await pool.close();
    progress.done();
    if (settings.json !== null)
      await writeFile(settings.json, `${JSON.stringify(report, null, 2)}
`);
    if (settings.markdown !== null) await writeFile(settings.markdown, renderMarkdown(report));
    if (!request.quiet) {
      const color = process.stdout.isTTY === true && process.env.NO_COLOR === void 0;
      process.stdout.write(renderTerminal(report, { color }));
    }
    return report.verdict === "fail" ? 1 : 0;
  } catch (error) {
    if (error instanceof InputError) {
      process.stderr.write(`skillgate: ${error.describe()}
`);
      return 2;
    }
    const message = printable(error instanceof Error ? error.message : String(error));
    process.stderr.write(
      `skillgate: internal error: ${message}
This is a bug in skillgate; set SKILLGATE_DEBUG=1 for details.
`
    );
    if (process.env.SKILLGATE_DEBUG && error instanceof Error)
      process.stderr.write(`${error.stack}
`);
    return 3;
  }
}
main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
