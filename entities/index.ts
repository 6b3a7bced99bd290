import { BaseSchema } from "./base";
import { EmailTokenSchema } from "./EmailToken";
import { InvitationSchema } from "./Invitation";
import { LoginAttemptSchema } from "./LoginAttempt";
import { PlanSchema } from "./Plan";
import { PlanMemberSchema } from "./PlanMember";
import { PlanRevisionSchema } from "./PlanRevision";
import { PriceListSchema } from "./PriceList";
import { RateBucketSchema } from "./RateBucket";
import { RulePresetSchema } from "./RulePreset";
import { ShareLinkSchema } from "./ShareLink";
import { ShopCheckSchema } from "./ShopCheck";
import { UserSchema } from "./User";
import { WalkthroughSchema } from "./Walkthrough";
import { WallPhotoSchema } from "./WallPhoto";

/** Every entity, listed explicitly (folder discovery does not survive bundling). */
export const entities = [
  BaseSchema,
  UserSchema,
  PlanSchema,
  PlanRevisionSchema,
  LoginAttemptSchema,
  PriceListSchema,
  ShareLinkSchema,
  PlanMemberSchema,
  InvitationSchema,
  EmailTokenSchema,
  RulePresetSchema,
  WalkthroughSchema,
  WallPhotoSchema,
  ShopCheckSchema,
  RateBucketSchema,
];
